import PDFDocument from 'pdfkit';
import { renderPickList } from './pick-list-pdf';
import type { PickListResponse } from './reservation.dto';

const list = (over: Partial<PickListResponse> = {}): PickListResponse => ({
  jobId: 'job-1',
  reference: 'J-0012',
  title: 'Rear extension flat roof',
  siteAddress: '3 Harrow Lane, Hollowmere',
  jobDate: '2026-06-15',
  crew: 'Jonah and Bea',
  useBy: '2026-06-22',
  marginDays: 7,
  lines: [],
  unreserved: [
    {
      material: { id: 'mat-1', code: 'RES-D', name: 'Deck base resin' },
      unit: 'kg',
      quantity: '15',
      candidates: [
        {
          lot: { id: 'lot-1', batchNumber: 'B-11', expiresOn: '2026-07-01' },
          onHand: '4',
          free: '4',
          suggested: '4',
          places: [
            { locationId: 'loc-1', locationName: 'Flammables cabinet', quantity: '3' },
            { locationId: 'loc-2', locationName: 'Van 1', quantity: '1' },
          ],
        },
        {
          lot: { id: 'lot-2', batchNumber: 'B-12', expiresOn: '2026-08-01' },
          onHand: '25',
          free: '11',
          suggested: '11',
          places: [{ locationId: 'loc-1', locationName: 'Flammables cabinet', quantity: '25' }],
        },
        {
          lot: { id: 'lot-3', batchNumber: 'B-13', expiresOn: '2026-09-01' },
          onHand: '25',
          free: '25',
          suggested: null,
          places: [{ locationId: 'loc-1', locationName: 'Flammables cabinet', quantity: '25' }],
        },
      ],
      short: '0',
      passedOver: [
        {
          lot: { id: 'lot-4', batchNumber: 'B-09', expiresOn: '2026-06-30' },
          onHand: '25',
          flags: [{ code: 'exposure-flagged', message: 'Flagged “check before use”.' }],
        },
      ],
    },
    {
      material: { id: 'mat-2', code: 'TC-S', name: 'Topcoat slate grey' },
      unit: 'kg',
      quantity: '5',
      candidates: [],
      short: '5',
      passedOver: [],
    },
  ],
  issued: [],
  cautions: [{ id: 'flammable', title: 'Flammable', text: 'No smoking, no hot work.' }],
  ...over,
});

describe('the printed pick list', () => {
  let texts: string[];
  let spy: jest.SpyInstance;
  beforeEach(() => {
    texts = [];
    const original = PDFDocument.prototype.text;
    spy = jest.spyOn(PDFDocument.prototype, 'text').mockImplementation(function (
      this: PDFKit.PDFDocument,
      ...args: unknown[]
    ) {
      if (typeof args[0] === 'string') {
        texts.push(args[0]);
      }
      return (original as (...a: unknown[]) => PDFKit.PDFDocument).apply(this, args);
    });
  });
  afterEach(() => spy.mockRestore());

  it('lists each unreserved need with its suggested lots, where they are, and what must not be taken', async () => {
    const pdf = await renderPickList(list(), 'Tamsin Vale Roofing Ltd');
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect(texts).toEqual(
      expect.arrayContaining([
        'Needed but not reserved: suggested lots, first expiring first',
        '15 kg  Deck base resin (RES-D)',
        '[  ]  4 kg from batch B-11 · use by 2026-07-01 · from Flammables cabinet (3 kg), Van 1 (1 kg)',
        '[  ]  11 kg from batch B-12 · use by 2026-08-01 · from Flammables cabinet (25 kg)',
        'Also usable: batch B-13 (25 kg, use by 2026-09-01)',
        'Not to be taken: batch B-09: Flagged “check before use”.',
        '5 kg  Topcoat slate grey (TC-S)',
        'No usable lot in stock for this job: it must be ordered.',
        'No smoking, no hot work.',
      ]),
    );
    expect(texts.some((x) => x.includes('until 2026-06-22') && x.includes('7-day margin'))).toBe(true);
  });

  it('says what more must be ordered when the usable lots do not cover the need', async () => {
    const base = list().unreserved[0]!;
    await renderPickList(
      list({ unreserved: [{ ...base, candidates: base.candidates.slice(0, 1), short: '11' }] }),
      'Tamsin Vale Roofing Ltd',
    );
    expect(texts).toContain('11 kg more cannot be found in usable stock: it must be ordered.');
  });
});
