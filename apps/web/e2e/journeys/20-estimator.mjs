import { expect, signIn, signOut } from './helpers.mjs';

// The estimator's day end to end: a new job for a new customer, an L-shaped roof typed as a
// polygon, the plan and its totals, an estimate accepted, the materials reserved for the date;
// then the storeman issues part of them and books a part-pack back. Everything it makes has a
// unique name, so it runs on any copy of the demo data, as often as wanted.

const L_SHAPE = [
  ['0', '0'],
  ['8', '0'],
  ['8', '4'],
  ['4', '4'],
  ['4', '7'],
  ['0', '7'],
];
const SIDES = ['Drip', 'Kerb', 'Angle', 'Wall (upstand)', 'Kerb', 'Drip'];

function inDays(days) {
  const d = new Date();
  d.setDate(d.getDate() + days);
  return d.toISOString().slice(0, 10);
}

async function choose(page, scope, label, option) {
  await scope.getByRole('combobox', { name: label, exact: true }).click();
  await page.getByRole('option', { name: option, exact: true }).click();
}

export const journeys = {
  'the estimator draws an L-shaped roof, estimates and reserves it; the storeman issues and takes a return': async ({
    page,
    shot,
  }) => {
    const stamp = Date.now().toString(36);
    const customer = `Journey Lettings ${stamp}`;

    // The estimator starts a job for a new customer.
    await signIn(page, 'estimator@demo.test');
    await page.getByRole('navigation').getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('heading', { name: 'Jobs', level: 1 }).waitFor();
    await shot('01-jobs');
    await page.getByRole('button', { name: 'New job' }).click();
    const dialog = page.getByRole('dialog', { name: 'New job' });
    await dialog.getByText('New customer').click();
    await dialog.getByLabel('Customer name').fill(customer);
    await dialog.getByLabel('Contact').fill('Ada Journey');
    await dialog.getByLabel('Site address').fill(`${stamp} Journey Row, Hollowmere HM4 2JR`);
    await dialog.getByLabel('Title').fill(`L-shaped roof ${stamp}`);
    await choose(page, dialog, 'Laid on', 'Timber deck');
    await dialog.getByLabel('Scheduled for').fill(inDays(12));
    await choose(page, dialog, 'Build-up', 'Standard deck, one layer 450 g');
    await shot('02-new-job');
    await dialog.getByRole('button', { name: 'Create job' }).click();
    await page.getByRole('heading', { name: new RegExp(`L-shaped roof ${stamp}`) }).waitFor();

    // The roof: one polygon typed corner by corner, each side classified.
    const area = page.getByRole('region', { name: /Area 1/ });
    await area.getByText('Polygon', { exact: true }).click();
    for (let i = 0; i < L_SHAPE.length; i++) {
      await area.getByRole('button', { name: 'Add a corner' }).click();
      await area.getByRole('textbox', { name: `Area 1 corner ${i + 1} x` }).fill(L_SHAPE[i][0]);
      await area.getByRole('textbox', { name: `Area 1 corner ${i + 1} y` }).fill(L_SHAPE[i][1]);
    }
    for (let i = 0; i < SIDES.length; i++) {
      await choose(page, area, `Kind of Area 1 side ${i + 1} → ${((i + 1) % SIDES.length) + 1}`, SIDES[i]);
    }
    const extras = page.getByRole('region', { name: 'Pipes, outlets and corners' });
    await extras.getByRole('textbox', { name: 'Pipes' }).fill('2');
    await extras.getByRole('textbox', { name: 'Outlets' }).fill('1');
    await extras.getByRole('switch', { name: 'I counted the corner pieces myself' }).check({ force: true });
    await extras.getByRole('textbox', { name: 'External corners' }).fill('5');
    await extras.getByRole('textbox', { name: 'Internal corners' }).fill('1');
    // 8 × 4 + 4 × 3 = 44 m² of deck (arithmetic), drawn and totalled by the domain as it is typed.
    const plan = page.getByTestId('roof-plan');
    expect((await plan.getAttribute('aria-label')) === 'Roof plan: Main roof 44 m²', 'the plan should show the 44 m² L');
    const totals = page.getByRole('region', { name: 'Roof totals' });
    await totals.getByText('44.45 m²').waitFor();
    await shot('03-roof-plan');
    await page.getByRole('button', { name: 'Save roof' }).click();
    await page.getByText('Roof saved.').waitFor();

    // The estimate, from the saved roof and the job's build-up.
    await page.getByRole('tab', { name: /Estimate/ }).click();
    await page.getByRole('button', { name: 'Run estimate' }).click();
    await page.getByRole('heading', { name: 'Version 1' }).waitFor({ timeout: 30_000 });
    const total = (await page.getByTestId('estimate-total').innerText()).trim();
    expect(/^£[\d,]+\.\d\d$/.test(total), `the estimate should have a total, not "${total}"`);
    await shot('04-estimate');
    await page.getByRole('button', { name: 'Accept version 1' }).click();
    await page.getByRole('dialog', { name: 'Accept version 1?' }).getByRole('button', { name: 'Accept version 1' }).click();
    await page.getByText('Version 1 accepted.').waitFor();

    // The laying check for the day.
    const laying = page.getByRole('form', { name: 'Laying check' });
    await laying.getByLabel('Air (°C)').fill('14');
    await laying.getByLabel('Humidity (%)').fill('70');
    await laying.getByLabel('Deck (°C)').fill('15');
    await laying.getByRole('button', { name: 'Check the day' }).click();
    await page.getByText(/Fit to lay|Not fit to lay/).waitFor();
    await shot('05-laying-check');

    // Quoted, won and scheduled; then the stock held for the day.
    await page.getByRole('button', { name: 'Change status' }).click();
    await page.getByRole('menuitem', { name: 'Mark quoted' }).click();
    await page.getByText(/is now quoted/).waitFor();
    await page.getByRole('button', { name: 'Change status' }).click();
    await page.getByRole('menuitem', { name: 'Mark won' }).click();
    await page.getByRole('dialog', { name: /Mark won/ }).getByRole('button', { name: 'Mark won' }).click();
    await page.getByText(/is now won/).waitFor();
    await page.getByRole('button', { name: 'Change status' }).click();
    await page.getByRole('menuitem', { name: 'Mark scheduled' }).click();
    await page.getByText(/is now scheduled/).waitFor();
    await page.getByRole('tab', { name: /Materials/ }).click();
    const reserved = page.getByRole('region', { name: 'Reservations' });
    await reserved.getByRole('button', { name: 'Reserve for the job date' }).click();
    await page.getByText(/All reserved|short$/).first().waitFor({ timeout: 30_000 });
    await shot('06-reserved');
    await signOut(page);

    // The storeman finds the job and sends part of its first pick-list line to site.
    await signIn(page, 'storeman@demo.test');
    await page.getByRole('navigation').getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('textbox', { name: 'Search jobs' }).fill(customer);
    await page.getByRole('link', { name: new RegExp(`L-shaped roof ${stamp}`) }).click();
    const pick = page.getByRole('region', { name: 'Pick list' });
    await pick.waitFor();
    expect((await page.getByText('£').count()) === 0, 'the storeman should see no prices');
    await shot('07-pick-list');
    const first = pick.getByRole('checkbox', { name: /^Issue line 1:/ });
    await first.check();
    const quantity = pick.getByRole('textbox', { name: /^Quantity to issue of / }).first();
    const full = Number(await quantity.inputValue());
    expect(full > 0, 'the pick list should hold something to issue');
    // A partial issue: one unit of the line, when it holds more.
    if (full > 1) {
      await quantity.fill('1');
    }
    await pick.getByRole('button', { name: 'Issue 1 line' }).click();
    await page.getByText(/^Issued to J-\d+/).waitFor();
    await shot('08-issued');

    // What comes back: a part-pack of that lot, weighed.
    const back = page.getByRole('region', { name: 'Issued and returned' });
    await back.getByRole('textbox', { name: /^Part-pack back of / }).first().fill('0.5');
    await back.getByRole('button', { name: 'Book the return' }).click();
    await page.getByText(/^Return booked for J-\d+/).waitFor();
    await shot('09-returned');
    await signOut(page);

    // The estimator calls the job off, so what is still held goes back for the next run.
    await signIn(page, 'estimator@demo.test');
    await page.getByRole('navigation').getByRole('link', { name: 'Jobs' }).click();
    await page.getByRole('textbox', { name: 'Search jobs' }).fill(customer);
    await page.getByRole('link', { name: new RegExp(`L-shaped roof ${stamp}`) }).click();
    await page.getByRole('button', { name: 'Change status' }).click();
    await page.getByRole('menuitem', { name: 'Cancel the job' }).click();
    const cancel = page.getByRole('dialog', { name: /Cancel the job/ });
    await cancel.getByLabel('Reason (optional)').fill('Browser journey: released for the next run');
    await cancel.getByRole('button', { name: 'Cancel the job' }).click();
    await page.getByText(/is now cancelled/).waitFor();
    await signOut(page);
  },
};
