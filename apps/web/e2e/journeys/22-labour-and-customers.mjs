import { expect, navLabels, signIn } from './helpers.mjs';

// The estimator's people: a customer added on the Customers screen, a job for them with its
// estimator chosen, then the crew's hours on a job in progress and the reconciliation that uses
// them. Everything it makes has a unique name, so it runs on any copy of the demo data, as often
// as wanted (the hours it records add to whatever the in-progress demo job already has).

function today() {
  const d = new Date();
  return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

async function choose(page, scope, label, option) {
  await scope.getByRole('combobox', { name: label, exact: true }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

export const journeys = {
  'the estimator adds a customer, starts their job with an estimator, and records the crew’s hours': async ({
    page,
    shot,
  }) => {
    const stamp = Date.now().toString(36);
    const customer = `Kestrel Yard Studios ${stamp}`;
    const crewMember = `Tamsin Journey ${stamp}`;

    await signIn(page, 'estimator@demo.test');
    expect((await navLabels(page)).includes('Customers'), 'the estimator should see Customers in the navigation');

    // Customers: the list, then a new one.
    await page.getByRole('navigation').getByRole('link', { name: 'Customers' }).click();
    await page.getByRole('heading', { name: 'Customers', level: 1 }).waitFor();
    await page.getByRole('table').getByRole('link').first().waitFor();
    await shot('01-customers');
    await page.getByRole('button', { name: 'New customer' }).click();
    const form = page.getByRole('dialog', { name: 'New customer' });
    await form.getByLabel('Name').fill(customer);
    await form.getByLabel('Contact').fill('Iona Brack');
    await form.getByLabel('E-mail').fill(`iona.${stamp}@kestrelyard.test`);
    await form.getByLabel('Phone').fill('01632 960 731');
    await form.getByLabel('Billing address').fill('4 Kestrel Yard, Hollowmere HM5 1KY');
    await shot('02-new-customer');
    await form.getByRole('button', { name: 'Add customer' }).click();
    await page.getByRole('heading', { name: customer, level: 1 }).waitFor();
    await page.getByText('No jobs for this customer yet.', { exact: false }).waitFor();
    await shot('03-customer-page');

    // A job for them, with the owner chosen as its estimator.
    await page.getByRole('navigation').getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('button', { name: 'New job' }).click();
    const dialog = page.getByRole('dialog', { name: 'New job' });
    const picker = dialog.getByRole('combobox', { name: 'Estimator', exact: true });
    // The people load with the form; the estimator starts as me.
    for (let i = 0; i < 50 && (await picker.inputValue()) !== 'Dev Okafor (me)'; i++) {
      await page.waitForTimeout(100);
    }
    expect((await picker.inputValue()) === 'Dev Okafor (me)', 'the estimator should default to me');
    await dialog.getByRole('combobox', { name: 'Customer', exact: true }).fill(stamp);
    await page.getByRole('option', { name: new RegExp(customer) }).click();
    await dialog.getByLabel('Site address').fill(`${stamp} Kestrel Yard, Hollowmere HM5 1KY`);
    await choose(page, dialog, 'Laid on', 'Concrete');
    await choose(page, dialog, 'Estimator', 'Marta Quill');
    await shot('04-new-job-estimator');
    await dialog.getByRole('button', { name: 'Create job' }).click();
    await page.getByRole('heading', { name: /Kestrel Yard/, level: 1 }).waitFor();
    await page.getByText('Marta Quill', { exact: true }).first().waitFor();

    // Back on the customer's page, the job is listed and links to the job.
    await page.getByRole('navigation').getByRole('link', { name: 'Customers' }).click();
    await page.getByRole('textbox', { name: 'Search customers' }).fill(stamp);
    await page.getByRole('link', { name: customer }).click();
    const jobs = page.getByRole('region', { name: 'Jobs for this customer' });
    await jobs.getByText('Enquiry', { exact: true }).waitFor();
    await shot('05-customer-jobs');

    // A demo job in progress: the crew's hours.
    await page.goto('/jobs?status=in-progress');
    await page.getByRole('table').getByRole('link').first().click();
    await page.getByRole('tab', { name: 'Labour' }).click();
    const sheet = page.getByRole('region', { name: 'Record hours' });
    await sheet.getByLabel('Worked on', { exact: true }).fill(today());
    await sheet.getByLabel('Hours', { exact: true }).fill('25');
    await sheet.getByRole('button', { name: 'Record hours' }).click();
    await sheet.getByText('A day has at most 24 hours').waitFor();
    await sheet.getByLabel('Hours', { exact: true }).fill('7.5');
    await sheet.getByPlaceholder('Crew member’s name').fill(crewMember);
    await sheet.getByLabel('Note', { exact: true }).fill('Second coat of topcoat');
    await sheet.getByRole('button', { name: 'Record hours' }).click();
    await page.getByText(`${crewMember}: 7.5 h`).waitFor();
    // The reconciliation now prices labour from the recorded hours, not the estimate's.
    const basis = page.getByTestId('labour-basis');
    await basis.filter({ hasText: 'h recorded ×' }).waitFor();
    await shot('06-labour-recorded');

    // A mistake struck out (asked first), kept on the sheet.
    await sheet.getByLabel('Hours', { exact: true }).fill('3');
    await sheet.getByPlaceholder('Crew member’s name').fill(crewMember);
    await sheet.getByRole('button', { name: 'Record hours' }).click();
    await page.getByText(`${crewMember}: 10.5 h`).waitFor();
    await page.getByRole('button', { name: new RegExp(`^Strike out 3 h for ${crewMember}`) }).click();
    const confirm = page.getByRole('dialog', { name: 'Strike out this entry?' });
    await confirm.getByLabel('Why (optional)').fill('Typed twice');
    await confirm.getByRole('button', { name: 'Strike out' }).click();
    await page.getByText(`${crewMember}: 7.5 h`).waitFor();
    await page.getByText(/Struck out by Dev Okafor on .*: Typed twice/).first().waitFor();
    await shot('07-labour-struck-out');

    // The materials tab's estimated against used (the demo job in progress has had stock issued)
    // prices labour the same way.
    await page.getByRole('tab', { name: 'Materials' }).click();
    const panel = page.getByRole('region', { name: 'Estimated against used' });
    await panel.getByTestId('labour-basis').filter({ hasText: 'h recorded ×' }).waitFor();
    await panel.scrollIntoViewIfNeeded();
    await shot('08-reconciliation');
  },
};
