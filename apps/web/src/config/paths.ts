// Every route of the web app. Links and the router use these, never a string of their own.
export const paths = {
  home: '/',
  signIn: '/sign-in',
  register: '/register',
  invitation: '/invitation/:token',
  users: '/users',
  mailOutbox: '/mail',
  // The estimator's work: jobs, their roofs, estimates and materials; the calendar; build-ups.
  jobs: '/jobs',
  job: '/jobs/:jobId',
  calendar: '/calendar',
  buildUps: '/build-ups',
} as const;

export const hrefs = {
  invitation: (token: string) => `/invitation/${encodeURIComponent(token)}`,
  mailMessage: (messageId: string) => `${paths.mailOutbox}?message=${encodeURIComponent(messageId)}`,
  job: (jobId: string, tab?: string) => `/jobs/${encodeURIComponent(jobId)}${tab ? `?tab=${encodeURIComponent(tab)}` : ''}`,
} as const;
