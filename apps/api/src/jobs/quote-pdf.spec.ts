import { pounds } from './pdf';
import { QuoteData, renderQuote, scopeOfWork } from './quote-pdf';

const data = (over: Partial<QuoteData['estimate']> = {}): QuoteData => ({
  company: {
    name: 'Tamsin Vale Roofing Ltd',
    address: 'Unit 4, Coppice Yard, Hollowmere',
    phone: null,
    email: null,
    vatNumber: null,
  },
  customer: { name: 'Harrow Lane Surgery', contactName: null, billingAddress: null },
  job: {
    reference: 'J-0007',
    title: 'Waiting room roof',
    siteAddress: '3 Harrow Lane',
    substrate: 'existing-felt',
    topcoatColour: 'Slate grey',
  },
  estimate: {
    version: 2,
    deckAreaM2: '33',
    upstandAreaM2: '1.45',
    laminatedAreaM2: '34.45',
    pipes: 2,
    outlets: 1,
    lines: [
      { role: 'trim:drip', metres: '14' },
      { role: 'trim:wall', metres: '8' },
      { role: 'mat', metres: null },
    ],
    price: { net: '2167.27', vat: '433.45', vatRatePct: '20', gross: '2600.72' },
    cautions: [{ id: 'work-at-height', title: 'Work at height', text: 'Edge protection.' }],
    ...over,
  } as never,
  layers: '1',
  matGsm: '450',
  issuedOn: '1 December 2026',
  validUntil: '31 December 2026',
});

describe('the customer quote', () => {
  it('puts the scope in plain words from the take-off (arithmetic, no outside source)', () => {
    expect(scopeOfWork(data())).toEqual([
      'Prepare the existing felt roof (33 m²) so it is sound, dry and clean, and fix timber battens at the edges.',
      'Fix pre-formed GRP edge trims: 14 m of drip trim, 8 m of wall trim, with joints and corners dressed in glass bandage.',
      'Laminate 34.5 m² (including 1.5 m² of wall upstands) with one layer of 450 g/m² glass-fibre mat in polyester resin, consolidated to drive out air.',
      'Dress 2 pipes and 1 outlet into the roof.',
      'Finish with a slate grey pigmented topcoat over the roof and trims once the laminate has cured and been sanded.',
      'Clear away our materials and waste from site.',
    ]);
  });

  it.each([
    ['0', '£0.00'],
    ['2167.27', '£2,167.27'],
    ['1234567.5', '£1,234,567.50'],
    ['-12.3', '-£12.30'],
  ])('writes %s as %s', (amount, text) => {
    expect(pounds(amount)).toBe(text);
  });

  it('renders a PDF', async () => {
    const pdf = await renderQuote(data());
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
  });
});
