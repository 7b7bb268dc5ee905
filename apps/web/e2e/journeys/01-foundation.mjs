import { expect, navLabels, signIn, signOut } from './helpers.mjs';

const NAV = {
  'owner@demo.test': { has: ['Home', 'Users', 'Mail outbox'], not: [] },
  'estimator@demo.test': { has: ['Home'], not: ['Users', 'Mail outbox'] },
  'storeman@demo.test': { has: ['Home'], not: ['Users', 'Mail outbox'] },
};

export const journeys = {
  'each demo user signs in and sees their role’s navigation': async ({ page, shot }) => {
    for (const [email, nav] of Object.entries(NAV)) {
      await signIn(page, email);
      const labels = await navLabels(page);
      for (const l of nav.has) {
        expect(labels.some((x) => x.startsWith(l)), `${email} should see "${l}" in ${JSON.stringify(labels)}`);
      }
      for (const l of nav.not) {
        expect(!labels.some((x) => x.startsWith(l)), `${email} should not see "${l}"`);
      }
      await shot(email.split('@')[0]);
      await signOut(page);
    }
  },

  'a wrong password is refused with a clear message': async ({ page }) => {
    await page.goto('/sign-in');
    await page.getByLabel('E-mail').fill('owner@demo.test');
    await page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('do not match a Potlife sign-in').waitFor();
  },

  'the owner invites a storeman, and the invitation arrives in the mail outbox': async ({ page, shot }) => {
    await signIn(page, 'owner@demo.test');
    await page.getByRole('navigation').getByRole('link', { name: /Users/ }).click();
    await page.getByRole('heading', { name: 'Users' }).waitFor();
    const email = `new.storeman.${Date.now()}@demo.test`;
    await page.getByRole('button', { name: /Invite/ }).first().click();
    const dialog = page.getByRole('dialog');
    await dialog.getByLabel('Name').fill('Nia Newcombe');
    await dialog.getByLabel('E-mail').fill(email);
    await dialog.getByLabel('Role').click();
    await page.getByRole('option', { name: /storeman/i }).click();
    await dialog.getByRole('button', { name: /Send invitation|Invite/ }).click();
    await page.getByRole('cell', { name: email }).waitFor();
    await shot('users-after-invite');
    await page.getByRole('navigation').getByRole('link', { name: /Mail outbox/ }).click();
    await page.getByText(email).first().waitFor({ timeout: 20_000 });
    await shot('mail-outbox');
  },

  'an expired session returns to sign-in with a message': async ({ page }) => {
    await signIn(page, 'estimator@demo.test');
    // A token the server no longer accepts (as after expiry): the app must send the user to sign-in.
    await page.evaluate(() => {
      const t = localStorage.getItem('potlife.accessToken') ?? '';
      localStorage.setItem('potlife.accessToken', `${t.split('.').slice(0, 2).join('.')}.not-a-valid-signature`);
    });
    await page.reload();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.getByText(/session has expired|sign in again/i).first().waitFor();
  },
};
