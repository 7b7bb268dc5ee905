// The storeman's day: a delivery of two lots with its delivery note, their labels, a count of the
// location with one difference; then the owner approves the count. Everything it touches it makes
// itself (a location of its own, unique batch numbers), so it runs on any demo database, again.
import { expect, signIn, signOut } from './helpers.mjs';

// A 1 × 1 pixel PNG: a real image, so the API's check of the content (not the name) accepts it.
const DELIVERY_NOTE_PNG = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNkYPhfDwAChwGA60e6kgAAAABJRU5ErkJggg==',
  'base64',
);

/** Picks an option of a Mantine Select (the options open in a portal, outside the form). */
async function choose(page, field, option) {
  await field.click();
  await page.getByRole('option', { name: option }).first().click();
}

export const journeys = {
  'the storeman receives two lots with a delivery note, prints their labels and counts them; the owner approves':
    async ({ page, context, shot }) => {
      // A full-page shot of a scrolled page draws the fixed header half-way down: scroll up first.
    const snap = async (label) => {
      await page.evaluate(() => window.scrollTo(0, 0));
      await shot(label);
    };
    const stamp = Date.now().toString(36).toUpperCase();
      const bay = `Count bay ${stamp}`;
      const matBatch = `CS30-${stamp}`;
      const tapeBatch = `BT-${stamp}`;

      await signIn(page, 'storeman@demo.test');
      await page.getByRole('heading', { name: /Good (morning|afternoon|evening)/ }).waitFor();
      await page.getByRole('region', { name: 'Expiring within 30 days' }).waitFor();
      await snap('01-home');

      // A location of its own, so the count covers only what this journey put there.
      await page.getByRole('navigation').getByRole('link', { name: 'Stock' }).click();
      await page.getByRole('tab', { name: 'Store layout' }).click();
      await page.getByRole('button', { name: 'Add a location' }).click();
      const locationDialog = page.getByRole('dialog', { name: 'Add a location' });
      await locationDialog.getByLabel('Name').fill(bay);
      await choose(page, locationDialog.getByRole('combobox', { name: 'Kind' }), 'Bay');
      await choose(page, locationDialog.getByRole('combobox', { name: 'Inside' }), /^Main store$/);
      await locationDialog.getByRole('button', { name: 'Add location' }).click();
      await page.getByRole('cell', { name: `Main store › ${bay}` }).waitFor();
      await snap('02-location-added');

      // The delivery: two lines, two lots, with the delivery note as a file.
      await page.getByRole('navigation').getByRole('link', { name: 'Receive' }).click();
      await page.getByRole('link', { name: 'Receive a delivery' }).first().click();
      await page.getByRole('heading', { name: 'Receive a delivery' }).waitFor();
      await choose(page, page.getByRole('combobox', { name: 'Supplier' }), 'Brackenfield Resin Supply');
      await page.getByLabel('Delivery note number').fill(`DN-${stamp}`);
      await page.locator('input[type=file][name=deliveryNote]').setInputFiles({
        name: `delivery-note-${stamp}.png`,
        mimeType: 'image/png',
        buffer: DELIVERY_NOTE_PNG,
      });
      await page.getByText(`delivery-note-${stamp}.png`).waitFor();

      const line1 = page.getByRole('group', { name: 'Line 1' });
      await choose(page, line1.getByRole('combobox', { name: 'Material' }), /^MAT-300 /);
      await line1.getByLabel('Batch number').fill(matBatch);
      await line1.getByLabel('Packs taken in').fill('2');
      await choose(page, line1.getByRole('combobox', { name: 'Put away at' }), `Main store › ${bay}`);

      await page.getByRole('button', { name: 'Add a line' }).click();
      const line2 = page.getByRole('group', { name: 'Line 2' });
      await choose(page, line2.getByRole('combobox', { name: 'Material' }), /^BND-100 /);
      await line2.getByLabel('Batch number').fill(tapeBatch);
      await line2.getByLabel('Packs taken in').fill('3');
      // The new line starts at the location of the line above.
      expect(
        (await line2.getByRole('combobox', { name: 'Put away at' }).inputValue()).includes(bay),
        'the second line should start at the first line’s location',
      );
      await snap('03-receive-form');

      await page.getByRole('button', { name: 'Check and book in' }).click();
      await page.getByRole('heading', { name: 'Check the delivery' }).waitFor();
      await snap('04-receive-check');
      await page.getByRole('button', { name: 'Book it in' }).click();
      await page.getByRole('heading', { name: /^Receipt \d+$/ }).waitFor({ timeout: 20_000 });
      await page.getByText('Booked in', { exact: true }).first().waitFor();
      await page.getByText(`delivery-note-${stamp}.png`).waitFor();
      expect(
        await page.getByRole('link', { name: matBatch }).isVisible(),
        'the receipt should link to the mat lot',
      );
      expect(
        await page.getByRole('link', { name: tapeBatch }).isVisible(),
        'the receipt should link to the tape lot',
      );
      await snap('05-receipt');

      // The labels: the PDF comes from the API and opens in a tab of its own. The route hands the
      // answer on unchanged and keeps a copy to check.
      let labels = null;
      await page.route('**/api/receipts/*/labels.pdf', async (route) => {
        const response = await route.fetch();
        labels = {
          status: response.status(),
          type: response.headers()['content-type'] ?? '',
          body: await response.body(),
        };
        await route.fulfill({ response });
      });
      const popup = context.waitForEvent('page', { timeout: 10_000 }).catch(() => null);
      await page.getByRole('button', { name: 'Print labels' }).first().click();
      const tab = await popup;
      for (let i = 0; i < 50 && labels === null; i++) {
        await page.waitForTimeout(200);
      }
      expect(labels !== null, 'Print labels should fetch labels.pdf');
      expect(labels.status === 200, `labels.pdf answered ${labels.status}`);
      expect(labels.type.includes('application/pdf'), `labels.pdf came as ${labels.type}`);
      expect(labels.body.subarray(0, 5).toString('latin1') === '%PDF-', 'labels.pdf should start with %PDF-');
      expect(labels.body.length > 1000, `labels.pdf is only ${labels.body.length} bytes`);
      await page.unroute('**/api/receipts/*/labels.pdf');
      if (tab) {
        await tab.close();
      }
      await snap('06-labels-printed');

      // The count: blind entry, the mat as expected, the tape two metres short.
      await page.getByRole('navigation').getByRole('link', { name: 'Counts' }).click();
      await page.getByRole('button', { name: 'Open a count' }).click();
      const countDialog = page.getByRole('dialog', { name: 'Open a count' });
      await choose(
        page,
        countDialog.getByRole('combobox', { name: 'What to count' }),
        `Main store › ${bay} (and what is inside it)`,
      );
      await countDialog.getByRole('button', { name: 'Open the count' }).click();
      await page.getByRole('heading', { name: new RegExp(`^Count \\d+: ${bay}$`) }).waitFor();
      const countUrl = page.url();
      expect(
        (await page.getByText(/ledger \d/).count()) === 0,
        'the storeman must not see the expected figures while counting',
      );
      await page.getByLabel(new RegExp(`^Counted Chopped strand mat 300 g/m² ${matBatch}`)).fill('199.68');
      await page.getByLabel(new RegExp(`^Counted Glass bandage tape 100 mm ${tapeBatch}`)).fill('148');
      await snap('07-count-entry');
      await page.getByRole('button', { name: 'Submit' }).click();
      await page
        .getByRole('dialog', { name: /^Submit count \d+\?$/ })
        .getByRole('button', { name: 'Submit' })
        .click();
      await page.getByText('Awaiting approval').first().waitFor();
      await page.getByRole('row').filter({ hasText: 'Less than expected' }).first().waitFor();
      expect((await page.getByText('Matches', { exact: true }).count()) === 1, 'one line should match');
      expect(
        (await page.getByRole('row').filter({ hasText: 'Less than expected' }).count()) === 1,
        'exactly one line should be short',
      );
      await snap('08-count-submitted');
      await signOut(page);

      // The owner approves: the difference is posted as an adjustment.
      await signIn(page, 'owner@demo.test');
      await page.goto(countUrl);
      await page.getByRole('heading', { name: 'Your decision' }).waitFor();
      await snap('09-owner-reviews');
      await page.getByRole('button', { name: /^Approve and post 1 adjustment$/ }).click();
      await page
        .getByRole('dialog', { name: /^Approve count \d+\?$/ })
        .getByRole('button', { name: 'Approve' })
        .click();
      await page.getByRole('heading', { name: 'Adjustments posted' }).waitFor();
      expect(await page.getByText('−2 m').first().isVisible(), 'the adjustment should take 2 m off the tape');
      await snap('10-count-approved');
    },
};
