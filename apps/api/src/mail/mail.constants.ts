export const MAIL_QUEUE = 'mail';
export const SEND_JOB = 'send';
export const COMPANY_HEADER = 'X-Potlife-Company';
