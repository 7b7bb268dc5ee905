import { daysToExpiry, isExpired } from '@potlife/domain';
import dayjs from 'dayjs';

/** Lots expiring within this many days are shown as expiring soon (issue 4: "lots expiring within 30 days"). Potlife's own. */
export const EXPIRING_SOON_DAYS = 30;

/** Today's calendar date where the server runs, YYYY-MM-DD. */
export function today(): string {
  return dayjs().format('YYYY-MM-DD');
}

export type ExpiryBadge = 'expired' | 'expiring' | 'ok' | 'none';

export interface ExpiryInfo {
  expiresOn: string | null;
  /** whole days left (0 on the expiry date, negative once expired); null with no expiry date */
  daysToExpiry: number | null;
  badge: ExpiryBadge;
}

/** Expiry badge data for a lot, from the domain's expiry rules. */
export function expiryInfo(expiresOn: string | null, onDate: string = today()): ExpiryInfo {
  if (!expiresOn) {
    return { expiresOn: null, daysToExpiry: null, badge: 'none' };
  }
  const days = daysToExpiry(expiresOn, onDate);
  const badge: ExpiryBadge = isExpired(expiresOn, onDate) ? 'expired' : days <= EXPIRING_SOON_DAYS ? 'expiring' : 'ok';
  return { expiresOn, daysToExpiry: days, badge };
}
