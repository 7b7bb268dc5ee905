import { expect, signIn, signOut } from './helpers.mjs';

// A need that was not reserved, sent to site from the pick list. The estimator makes a small job
// through the API (customer, roof, estimate accepted, won and scheduled, nothing reserved: every
// need is unreserved); the storeman opens it, sees the lots that could go now with the FEFO
// suggestion chosen, issues it, and sees it counted as issued. Unique names: it runs on any copy
// of the demo data. It needs usable stock of at least one of the job's materials that no other
// job holds (the demo's slate grey topcoat, trims and corner pieces).

function inDays(days) {
  const d = new Date();
  d.setDate(d.getDate() + days);
  return d.toISOString().slice(0, 10);
}

const SMALL_ROOF = {
  areas: [{ name: 'Porch', shape: 'rectangle', lengthM: '2.4', widthM: '1.5' }],
  edges: [
    { kind: 'drip', lengthM: '2.4' },
    { kind: 'kerb', lengthM: '1.5' },
    { kind: 'kerb', lengthM: '2.4' },
    { kind: 'kerb', lengthM: '1.5' },
  ],
};

/** The API as a signed-in user, for setting the scene. */
async function apiAs(page, email) {
  const login = await page.request.post('/api/auth/login', { data: { email, password: 'potlife-demo' } });
  expect(login.ok(), `sign-in of ${email} through the API failed: ${login.status()}`);
  const { accessToken } = await login.json();
  const call = async (method, path, data) => {
    const res = await page.request.fetch(`/api${path}`, {
      method,
      headers: { Authorization: `Bearer ${accessToken}` },
      ...(data === undefined ? {} : { data }),
    });
    expect(res.ok(), `${method} ${path} answered ${res.status()}: ${await res.text()}`);
    return res.json();
  };
  return call;
}

export const journeys = {
  'the storeman issues an unreserved need from the suggested lot and sees it counted as issued': async ({
    page,
    shot,
  }) => {
    const stamp = Date.now().toString(36);
    const title = `Porch roof ${stamp}`;

    // The scene, as the estimator: a won, scheduled job with an accepted estimate and nothing reserved.
    const estimator = await apiAs(page, 'estimator@demo.test');
    const buildUps = await estimator('GET', '/build-ups');
    const buildUp =
      (Array.isArray(buildUps) ? buildUps : buildUps.items).find((b) => b.active !== false) ?? null;
    expect(buildUp, 'the demo should have a build-up');
    const customer = await estimator('POST', '/customers', {
      name: `Journey Porches ${stamp}`,
      billingAddress: `${stamp} Porch Lane, Hollowmere`,
    });
    const job = await estimator('POST', '/jobs', {
      customerId: customer.id,
      buildUpId: buildUp.id,
      title,
      siteAddress: `${stamp} Porch Lane, Hollowmere HM3 1PL`,
      substrate: 'timber-deck',
      topcoatColour: 'Slate grey',
      scheduledOn: inDays(9),
    });
    await estimator('PUT', `/jobs/${job.id}/roof`, SMALL_ROOF);
    await estimator('POST', `/jobs/${job.id}/estimates`, {});
    await estimator('POST', `/jobs/${job.id}/estimates/1/accept`);
    for (const status of ['quoted', 'won', 'scheduled']) {
      await estimator('POST', `/jobs/${job.id}/status`, { status });
    }
    const list = await estimator('GET', `/jobs/${job.id}/pick-list`);
    const need = list.unreserved.find((u) => u.candidates.some((c) => c.suggested !== null));
    expect(
      need,
      'one of the job’s materials should have usable stock no other job holds: the demo seed needs some (e.g. slate grey topcoat)',
    );
    const suggested = need.candidates.find((c) => c.suggested !== null);

    // The storeman, on the desk first.
    await signIn(page, 'storeman@demo.test');
    await page.goto(`/jobs/${job.id}?tab=materials`);
    const pick = page.getByRole('region', { name: 'Pick list' });
    await pick.waitFor();
    const card = pick.getByRole('article', { name: `Not reserved: ${need.material.name}` });
    await card.waitFor();
    await shot('01-unreserved-desk');
    // The FEFO suggestion is chosen, the quantity is the need capped at what the lot may give.
    const lotLabel = `Lot ${suggested.lot.batchNumber ?? 'without a batch number'}`;
    const chosen = await card.getByRole('combobox', { name: `Lot for ${need.material.name}` }).inputValue();
    expect(
      chosen.startsWith(lotLabel) && chosen.endsWith('suggested'),
      `the suggested lot should be chosen, not "${chosen}"`,
    );
    const quantity = await card
      .getByRole('textbox', { name: `Quantity to issue of ${need.material.name}` })
      .inputValue();
    expect(
      quantity === suggested.suggested || Number(quantity) <= Number(suggested.free),
      `quantity ${quantity}`,
    );

    // On a phone in the store.
    await page.setViewportSize({ width: 390, height: 844 });
    await card.scrollIntoViewIfNeeded();
    await shot('02-unreserved-phone');
    await card.getByRole('button', { name: `Issue ${need.material.name}` }).click();
    await page.getByText(`Issued to ${job.reference}`).waitFor();
    await shot('03-issued-phone');

    // Counted as issued: on the issued-and-returned panel, and the need is lower or gone.
    const back = page.getByRole('region', { name: 'Issued and returned' });
    await back.getByText(need.material.name).first().waitFor();
    const after = await estimator('GET', `/jobs/${job.id}/pick-list`);
    const issued = after.issued.find((i) => i.material.id === need.material.id);
    expect(issued && Number(issued.issued) === Number(quantity), `${quantity} should be counted as issued`);
    const left = after.unreserved.find((u) => u.material.id === need.material.id);
    expect(
      !left || Number(left.quantity) === Number(need.quantity) - Number(quantity),
      'the outstanding need should be lower',
    );
    await page.setViewportSize({ width: 1280, height: 860 });
    await back.scrollIntoViewIfNeeded();
    await shot('04-issued-desk');
    await signOut(page);
  },
};
