// Shared steps for the journeys.
export const DEMO_PASSWORD = 'potlife-demo';

export async function signIn(page, email, password = DEMO_PASSWORD) {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('button', { name: 'Sign out' }).waitFor();
}

export async function signOut(page) {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.getByRole('button', { name: 'Sign in' }).waitFor();
}

export function expect(cond, message) {
  if (!cond) {
    throw new Error(message);
  }
}

/** The labels of the navbar's links. */
export async function navLabels(page) {
  const nav = page.getByRole('navigation');
  return (await nav.getByRole('link').allInnerTexts()).map((t) => t.trim()).filter(Boolean);
}
