// Every route of the web app. Links and the router use these, never a string of their own.
export const paths = {
  home: '/',
  signIn: '/sign-in',
  register: '/register',
  invitation: '/invitation/:token',
  users: '/users',
  mailOutbox: '/mail',
  // The store (storeman): receiving, stock, counts, temperatures; the catalogue and suppliers.
  stock: '/stock',
  lot: '/stock/lots/:lotId',
  receipts: '/receipts',
  receiptNew: '/receipts/new',
  receipt: '/receipts/:receiptId',
  counts: '/counts',
  count: '/counts/:countId',
  temperatures: '/temperatures',
  catalogue: '/catalogue',
  catalogueImport: '/catalogue/import',
  material: '/catalogue/materials/:materialId',
  suppliers: '/suppliers',
  supplier: '/suppliers/:supplierId',
  // The estimator's work: jobs, their roofs, estimates and materials; the calendar; build-ups.
  jobs: '/jobs',
  job: '/jobs/:jobId',
  calendar: '/calendar',
  buildUps: '/build-ups',
  customers: '/customers',
  customer: '/customers/:customerId',
} as const;

export const hrefs = {
  invitation: (token: string) => `/invitation/${encodeURIComponent(token)}`,
  mailMessage: (messageId: string) => `${paths.mailOutbox}?message=${encodeURIComponent(messageId)}`,
  stockView: (view: 'material' | 'location' | 'lot' | 'layout', filter: Record<string, string> = {}) =>
    `${paths.stock}?${new URLSearchParams({ view, ...filter }).toString()}`,
  lot: (lotId: string) => `/stock/lots/${encodeURIComponent(lotId)}`,
  receipt: (receiptId: string) => `/receipts/${encodeURIComponent(receiptId)}`,
  count: (countId: string) => `/counts/${encodeURIComponent(countId)}`,
  temperatures: (locationId?: string) =>
    locationId ? `${paths.temperatures}?location=${encodeURIComponent(locationId)}` : paths.temperatures,
  material: (materialId: string) => `/catalogue/materials/${encodeURIComponent(materialId)}`,
  supplier: (supplierId: string) => `/suppliers/${encodeURIComponent(supplierId)}`,
  customer: (customerId: string) => `/customers/${encodeURIComponent(customerId)}`,
  job: (jobId: string, tab?: string) =>
    `/jobs/${encodeURIComponent(jobId)}${tab ? `?tab=${encodeURIComponent(tab)}` : ''}`,
} as const;
