import { expect, signIn } from './helpers.mjs';

// The estimator runs an estimate on stock cost with one material chosen by hand, on a demo job
// that has a roof and a scheduled date (the quoted rear extension at 5 Pell Street), and sees the
// new version and its basis. Each run adds a version; nothing else is changed, so it runs on any
// copy of the demo data, as often as wanted.

export const journeys = {
  'the estimator runs an estimate on stock cost with a chosen mat': async ({ page, shot }) => {
    await signIn(page, 'estimator@demo.test');
    await page.getByRole('navigation').getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
    await page.getByRole('textbox', { name: 'Search jobs' }).fill('Pell Street');
    await page.getByText('1–1 of 1').waitFor();
    await page.getByRole('link', { name: /Rear extension, 5 Pell Street/ }).click();
    await page.waitForURL(/\/jobs\/[0-9a-f-]{36}/);
    await page.getByRole('tab', { name: /Estimate/ }).click();
    const form = page.getByRole('region', { name: 'Run an estimate' });
    await form.waitFor();
    const before = await page.getByRole('heading', { name: /^Version \d+$/ }).first().innerText();

    // Stock the job can reserve, explained in one line.
    await form.getByRole('radio', { name: 'Stock the job can reserve' }).check();
    await form.getByText(/Lots this job could reserve for its date, at what they cost/).waitFor();

    // The mat chosen by hand; the other roles keep what the last version used.
    await form.getByRole('button', { name: /Materials for this run/ }).click();
    const mat = form.getByRole('combobox', { name: 'Mat', exact: true });
    await mat.waitFor();
    // A mat other than the one the last version used (earlier runs may have chosen one already).
    const current = await mat.inputValue();
    const pick = current.includes('MAT-600') ? 'Chopped strand mat 300 g/m² (MAT-300)' : 'Chopped strand mat 600 g/m² (MAT-600)';
    await mat.click();
    await page.getByRole('option', { name: pick }).click();
    await form.getByText(/with 1 changed/).waitFor();
    await shot('01-run-options');

    await form.getByRole('button', { name: 'Run estimate' }).click();
    const made = page.getByRole('alert').filter({ hasText: /made/ }).first();
    await made.waitFor();
    const title = await made.innerText();
    expect(/on stock cost/.test(title), `the notice says the basis: ${title}`);
    const version = Number(/Version (\d+) made/.exec(title)?.[1]);
    expect(version > Number(before.replace(/\D/g, '')), `a new version after ${before}: ${title}`);

    const view = page.getByRole('region', { name: `Estimate version ${version}` });
    await view.waitFor();
    await view.getByText('Stock cost', { exact: true }).waitFor();
    await view.getByText(pick.replace(/ \(MAT-\d+\)$/, '')).first().waitFor();
    await shot('02-stock-version');
    const versions = page.getByRole('table').filter({ hasText: 'Costed at' });
    expect((await versions.getByText('Stock cost').count()) >= 1, 'the versions table says stock cost');
    await view.getByRole('table').first().scrollIntoViewIfNeeded();
    await shot('03-stock-lines');
  },
};
