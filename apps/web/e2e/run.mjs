// The users' journeys end to end: playwright-core driving Debian's /usr/bin/chromium against a
// running Potlife (BASE_URL). scripts/test.sh starts the servers and the demo data first.
//   BASE_URL=http://127.0.0.1:3101 node apps/web/e2e/run.mjs [name-filter]
import { mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const here = path.dirname(fileURLToPath(import.meta.url));
const baseURL = process.env.BASE_URL ?? 'http://127.0.0.1:3101';
const out = path.join(process.env.POTLIFE_TEST_OUTPUT ?? path.join(here, '../../../test-results'), 'screenshots');
mkdirSync(out, { recursive: true });
const filter = process.argv[2] ?? '';

const ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

const files = readdirSync(path.join(here, 'journeys')).filter((f) => f.endsWith('.mjs') && f.includes(filter)).sort();
let passed = 0;
let failed = 0;
for (const file of files) {
  const mod = await import(path.join(here, 'journeys', file));
  for (const [name, journey] of Object.entries(mod.journeys ?? {})) {
    const userDataDir = mkdtempSync(path.join(tmpdir(), 'potlife-chromium-'));
    const context = await chromium.launchPersistentContext(userDataDir, {
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ARGS,
      baseURL,
      viewport: { width: 1280, height: 860 },
    });
    context.setDefaultTimeout(15_000);
    const page = context.pages()[0] ?? (await context.newPage());
    const errors = [];
    page.on('pageerror', (e) => errors.push(e.message));
    const t0 = Date.now();
    const shot = async (label) => page.screenshot({ path: path.join(out, `${file.replace('.mjs', '')}--${label}.png`), fullPage: true });
    try {
      await journey({ page, context, baseURL, shot });
      if (errors.length) {
        throw new Error(`uncaught errors in the page: ${errors.join(' | ')}`);
      }
      passed++;
      console.log(`  ✓ ${file} › ${name} (${Date.now() - t0} ms)`);
    } catch (err) {
      failed++;
      console.log(`  ✗ ${file} › ${name}\n    ${String(err?.stack ?? err).split('\n').slice(0, 6).join('\n    ')}`);
      await shot(`FAILED-${name.replace(/\W+/g, '-')}`).catch(() => undefined);
    } finally {
      await context.close();
      rmSync(userDataDir, { recursive: true, force: true });
    }
  }
}
console.log(`\nbrowser journeys: ${passed} passed, ${failed} failed (screenshots in ${out})`);
process.exit(failed > 0 || passed === 0 ? 1 : 0);
