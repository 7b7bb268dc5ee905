import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { json, mockApi } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';

const older = {
  id: 'm1',
  from: 'Potlife <no-reply@potlife.test>',
  to: 'col@ridgeline.test',
  subject: 'You are invited to Potlife',
  receivedAt: '2025-03-09T08:01:00Z',
  attachmentCount: 0,
};
const newer = {
  id: 'm2',
  from: 'Potlife <no-reply@potlife.test>',
  to: 'orders@supplier.test',
  subject: 'Purchase order PO-0042',
  receivedAt: '2025-03-10T10:15:00Z',
  attachmentCount: 1,
};

describe('mail outbox', () => {
  it('lists the newest message first and opens one with its attachment', async () => {
    setAccessToken('owner-token');
    const { requests } = mockApi({
      'GET /api/auth/me': json(sessionUser('owner')),
      'GET /api/mail/messages': json([older, newer]),
      'GET /api/mail/messages/m2': json({
        ...newer,
        text: 'Please find our order attached.',
        html: null,
        attachments: [{ index: 0, filename: 'PO-0042.pdf', contentType: 'application/pdf', size: 48213 }],
      }),
      'GET /api/mail/messages/m2/attachments/0': json('pdf-bytes'),
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/mail' });

    expect(await screen.findByText(/local mail catcher/)).toBeInTheDocument();
    const links = await screen.findAllByRole('link', { name: /Purchase order|invited/ });
    expect(links.map((link) => link.textContent)).toEqual([
      'Purchase order PO-0042',
      'You are invited to Potlife',
    ]);

    await user.click(links[0]!);
    const drawer = await screen.findByRole('dialog', { name: 'Message' });
    expect(await within(drawer).findByText('orders@supplier.test')).toBeInTheDocument();
    expect(within(drawer).getByText('Please find our order attached.')).toBeInTheDocument();

    await user.click(within(drawer).getByRole('button', { name: 'Download PO-0042.pdf' }));
    await waitFor(() =>
      expect(requests.some((request) => request.path === '/api/mail/messages/m2/attachments/0')).toBe(true),
    );
    const download = requests.find((request) => request.path.endsWith('/attachments/0'));
    expect(download?.headers.get('Authorization')).toBe('Bearer owner-token');
  });
});
