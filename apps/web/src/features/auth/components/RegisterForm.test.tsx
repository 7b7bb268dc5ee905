import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { AppRoutes } from '../../../app/routes';
import { renderWithProviders } from '../../../test/render';
import { mockApi } from '../../../test/mock-api';

describe('register a company', () => {
  it('asks for every field, a 10-character password and the same password twice', async () => {
    const { requests } = mockApi({});
    const { user } = renderWithProviders(<AppRoutes />, { route: '/register' });

    await user.click(await screen.findByRole('button', { name: 'Register company' }));
    expect(await screen.findByText("Enter your company's name")).toBeInTheDocument();
    expect(screen.getByText('Enter your name')).toBeInTheDocument();
    expect(screen.getByText('Enter your e-mail address')).toBeInTheDocument();
    expect(screen.getByText('Choose a password')).toBeInTheDocument();

    await user.type(screen.getByLabelText('Password'), 'short');
    await user.type(screen.getByLabelText('Confirm password'), 'different');
    await user.click(screen.getByRole('button', { name: 'Register company' }));
    expect(await screen.findByText('Use at least 10 characters')).toBeInTheDocument();
    expect(screen.getByText('The two passwords are not the same')).toBeInTheDocument();
    expect(requests).toHaveLength(0);
  });
});
