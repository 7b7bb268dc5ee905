import { screen, waitFor, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { setAccessToken } from '../../../lib/auth-token';
import { sessionUser } from '../../../test/fixtures';
import { apiError, json, mockApi, type MockRequest } from '../../../test/mock-api';
import { renderWithProviders } from '../../../test/render';
import type { CompanyUser } from '../api/get-users';

const owner = sessionUser('owner');

const rows: CompanyUser[] = [
  {
    id: owner.id,
    email: owner.email,
    name: owner.name,
    role: 'owner',
    status: 'active',
    createdAt: '2025-03-01T08:00:00Z',
  },
  {
    id: 'user-2',
    email: 'ravi@ridgeline.test',
    name: 'Ravi Okafor',
    role: 'estimator',
    status: 'active',
    createdAt: '2025-03-04T08:00:00Z',
  },
  {
    id: 'user-3',
    email: 'col@ridgeline.test',
    name: 'Col Brennan',
    role: 'storeman',
    status: 'invited',
    createdAt: '2025-03-09T08:00:00Z',
  },
];

function signedInOwner(extra: Parameters<typeof mockApi>[0] = {}) {
  setAccessToken('owner-token');
  return mockApi({ 'GET /api/auth/me': json(owner), 'GET /api/users': json(rows), ...extra });
}

describe('users page', () => {
  it('lists the users with role and status, and filters them', async () => {
    signedInOwner();
    const { user } = renderWithProviders(<AppRoutes />, { route: '/users' });

    expect(await screen.findByRole('heading', { level: 1, name: 'Users' })).toBeInTheDocument();
    const ravi = (await screen.findByText('ravi@ridgeline.test')).closest('tr')!;
    expect(within(ravi).getByText('Ravi Okafor')).toBeInTheDocument();
    expect(within(ravi).getByText('Active')).toBeInTheDocument();
    expect(within(ravi).getByRole('combobox', { name: 'Role of Ravi Okafor' })).toHaveValue('Estimator');
    expect(screen.getByText('Invited')).toBeInTheDocument();
    expect(screen.getByText('col@ridgeline.test')).toBeInTheDocument();

    await user.type(screen.getByRole('textbox', { name: 'Filter users' }), 'storeman');
    await waitFor(() => expect(screen.queryByText('ravi@ridgeline.test')).not.toBeInTheDocument());
    expect(screen.getByText('col@ridgeline.test')).toBeInTheDocument();

    await user.clear(screen.getByRole('textbox', { name: 'Filter users' }));
    await user.type(screen.getByRole('textbox', { name: 'Filter users' }), 'nobody-like-this');
    expect(await screen.findByText(/No user matches "nobody-like-this"/)).toBeInTheDocument();
  });

  it('validates the invite form, then sends the invitation', async () => {
    const invited: MockRequest[] = [];
    signedInOwner({
      'POST /api/users/invitations': (request) => {
        invited.push(request);
        return json(
          {
            id: 'user-4',
            email: 'sam@ridgeline.test',
            name: 'Sam Hale',
            role: 'storeman',
            status: 'invited',
            createdAt: '2025-04-01T08:00:00Z',
          },
          201,
        );
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/users' });

    await user.click(await screen.findByRole('button', { name: 'Invite a user' }));
    const dialog = await screen.findByRole('dialog', { name: 'Invite a user' });
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));
    expect(await within(dialog).findByText('Enter their name')).toBeInTheDocument();
    expect(within(dialog).getByText('Enter their e-mail address')).toBeInTheDocument();
    expect(within(dialog).getByText('Choose a role')).toBeInTheDocument();

    await user.type(within(dialog).getByLabelText('Name'), 'Sam Hale');
    await user.type(within(dialog).getByLabelText('E-mail'), 'sam@');
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));
    expect(
      await within(dialog).findByText('Enter a whole e-mail address, like name@example.com'),
    ).toBeInTheDocument();
    expect(invited).toHaveLength(0);

    await user.type(within(dialog).getByLabelText('E-mail'), 'ridgeline.test');
    await user.click(within(dialog).getByRole('combobox', { name: 'Role' }));
    await user.click(await screen.findByRole('option', { name: 'Storeman' }));
    await user.click(within(dialog).getByRole('button', { name: 'Send invitation' }));

    await waitFor(() => expect(invited).toHaveLength(1));
    expect(invited[0]?.body).toEqual({ name: 'Sam Hale', email: 'sam@ridgeline.test', role: 'storeman' });
    expect(await screen.findByText('Invitation sent')).toBeInTheDocument();
    await waitFor(() =>
      expect(screen.queryByRole('dialog', { name: 'Invite a user' })).not.toBeInTheDocument(),
    );
  });

  it("asks before deactivating, and shows the server's refusal", async () => {
    const patches: MockRequest[] = [];
    signedInOwner({
      'PATCH /api/users/user-2': (request) => {
        patches.push(request);
        return apiError(409, 'The company must keep at least one active owner', 'LAST_OWNER');
      },
    });
    const { user } = renderWithProviders(<AppRoutes />, { route: '/users' });

    await user.click(await screen.findByRole('button', { name: 'Deactivate Ravi Okafor' }));
    const confirm = await screen.findByRole('dialog', { name: 'Deactivate Ravi Okafor?' });
    expect(patches).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Deactivate' }));

    await waitFor(() => expect(patches).toHaveLength(1));
    expect(patches[0]?.body).toEqual({ active: false });
    expect(await screen.findByText('The company must keep at least one active owner')).toBeInTheDocument();
  });
});
