// Receipts as the API sends them (apps/api/src/stock/dto/receipt.dto.ts).

export interface DeliveryNote {
  fileName: string;
  contentType: 'application/pdf' | 'image/jpeg' | 'image/png';
  sizeBytes: number;
  uploadedAt: string;
  url: string;
}

export interface ReceiptLine {
  id: string;
  lineNo: number;
  materialId: string;
  materialCode: string;
  materialName: string;
  stockUnit: string;
  purchaseOrderLineId: string | null;
  batchNumber: string | null;
  expiresOn: string | null;
  expiryComputed: boolean;
  packsReceived: number;
  packSize: string;
  packsRefused: number;
  refusedReason: string | null;
  quantity: string;
  unitCost: string;
  value: string;
  locationId: string | null;
  locationName: string | null;
  lotId: string | null;
  overDeliveryAllowed: boolean;
}

export interface Receipt {
  id: string;
  number: number;
  supplierId: string | null;
  supplierName: string | null;
  deliveryNoteNumber: string | null;
  receivedOn: string;
  note: string | null;
  receivedById: string;
  receivedByName: string;
  createdAt: string;
  deliveryNote: DeliveryNote | null;
  lines: ReceiptLine[];
  totalValue: string;
  labelsUrl: string;
  warnings: string[];
}

export interface ReceiptSummary {
  id: string;
  number: number;
  supplierName: string | null;
  deliveryNoteNumber: string | null;
  receivedOn: string;
  lineCount: number;
  packsReceived: number;
  packsRefused: number;
  totalValue: string;
  hasDeliveryNote: boolean;
  receivedByName: string;
  createdAt: string;
}

export interface ReceiptPage {
  items: ReceiptSummary[];
  total: number;
}

export interface ReceiptListParams {
  q?: string;
  from?: string;
  to?: string;
  limit: number;
  offset: number;
}

export interface ReceiptLineBody {
  materialId: string;
  batchNumber?: string;
  expiresOn?: string;
  packsReceived: number;
  packSize: string;
  packsRefused?: number;
  refusedReason?: string;
  unitCost?: string;
  locationId?: string;
}

export interface ReceiptBody {
  supplierId?: string;
  supplierName?: string;
  deliveryNoteNumber?: string;
  receivedOn: string;
  note?: string;
  lines: ReceiptLineBody[];
}

/** What the delivery note upload takes (the API checks the type from the content, too). */
export const DELIVERY_NOTE_ACCEPT: Record<string, string[]> = {
  'application/pdf': ['.pdf'],
  'image/jpeg': ['.jpg', '.jpeg'],
  'image/png': ['.png'],
};
export const DELIVERY_NOTE_MAX_BYTES = 10 * 1024 * 1024;

export function searchOf(params: object): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value !== undefined && value !== null && value !== '') {
      search.set(key, String(value).trim());
    }
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}

export const receivingKeys = {
  all: ['receipts'] as const,
  lists: () => [...receivingKeys.all, 'list'] as const,
  list: (params: ReceiptListParams) => [...receivingKeys.lists(), params] as const,
  detail: (id: string) => [...receivingKeys.all, 'detail', id] as const,
  choices: (what: 'suppliers' | 'materials' | 'locations') =>
    [...receivingKeys.all, 'choices', what] as const,
};

/** A receipt changes stock everywhere: the stock screens' queries start with this key. */
export const STOCK_KEY = ['stock'] as const;
