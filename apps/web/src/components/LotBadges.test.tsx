import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithProviders } from '../test/render';
import { ExpiryBadge, expiryText, LotBadges } from './LotBadges';

// The words follow the API's days to expiry: 0 on the expiry date, negative once expired (a lot
// may be used on its expiry date and is expired from the day after; common trade practice, no source).
describe('lot badges', () => {
  it.each([
    [{ expiresOn: '2025-06-01', daysToExpiry: -3, badge: 'expired' as const }, 'Expired 3 days ago'],
    [{ expiresOn: '2025-06-03', daysToExpiry: -1, badge: 'expired' as const }, 'Expired yesterday'],
    [{ expiresOn: '2025-06-04', daysToExpiry: 0, badge: 'expiring' as const }, 'Expires today'],
    [{ expiresOn: '2025-06-05', daysToExpiry: 1, badge: 'expiring' as const }, 'Expires tomorrow'],
    [{ expiresOn: '2025-06-16', daysToExpiry: 12, badge: 'expiring' as const }, 'Expires in 12 days'],
    [{ expiresOn: '2025-07-30', daysToExpiry: 56, badge: 'ok' as const }, 'Use by 30 Jul 2025'],
    [{ expiresOn: null, daysToExpiry: null, badge: 'none' as const }, 'No expiry'],
  ])('%j reads "%s"', (expiry, text) => {
    expect(expiryText(expiry)).toBe(text);
  });

  it('says the status and the exposure flag in words, not colour alone', () => {
    renderWithProviders(
      <>
        <LotBadges status="quarantined" exposureFlagged exposureReason="27.5 °C, above 25 °C" />
        <ExpiryBadge expiry={{ expiresOn: '2025-06-01', daysToExpiry: -3, badge: 'expired' }} />
      </>,
    );
    expect(screen.getByText('Quarantined')).toBeInTheDocument();
    expect(screen.getByText('Check before use')).toBeInTheDocument();
    expect(screen.getByText('Expired 3 days ago')).toBeInTheDocument();
  });
});
