// Every route of the web app. Links and the router use these, never a string of their own.
export const paths = {
  home: '/',
  signIn: '/sign-in',
  register: '/register',
  invitation: '/invitation/:token',
  users: '/users',
  mailOutbox: '/mail',
} as const;

export const hrefs = {
  invitation: (token: string) => `/invitation/${encodeURIComponent(token)}`,
  mailMessage: (messageId: string) => `${paths.mailOutbox}?message=${encodeURIComponent(messageId)}`,
} as const;
