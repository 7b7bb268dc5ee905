import QRCode from 'qrcode';
import { LabelData, labelCaution, renderLabels } from './labels';

const label = (over: Partial<LabelData> = {}): LabelData => ({
  lotId: '6f1c2d3e-0000-4000-8000-000000000001',
  url: 'https://potlife.test/stock/lots/6f1c2d3e-0000-4000-8000-000000000001',
  materialName: 'Orthophthalic base resin',
  materialCode: 'RES-25',
  materialKind: 'base-resin',
  hazardClass: '3',
  unNumber: '1866',
  batchNumber: 'B24-0917',
  expiresOn: '2025-09-30',
  receivedOn: '2025-06-02',
  quantityText: '25 kg',
  packText: 'Pack 1 of 2',
  receiptNumber: 12,
  ...over,
});

describe('labelCaution', () => {
  it.each([
    ['catalyst', '5.2', /Catalyst \(organic peroxide\) · class 5\.2/, /Never mix directly with accelerator/],
    ['base-resin', '3', /Flammable liquids · class 3/, /No smoking/],
    ['acetone', '3', /Flammable liquids/, /hot work/],
    ['other', '8', /Dangerous goods · class 8/, /safety data sheet/],
  ] as const)('%s (class %s) gets its caution', (kind, cls, title, text) => {
    const c = labelCaution(kind, cls)!;
    expect(c.title).toMatch(title);
    expect(c.text).toMatch(text);
    expect(c.text).toMatch(/safety data sheet/);
  });

  it('a mat roll gets none', () => {
    expect(labelCaution('mat', 'none')).toBeNull();
  });
});

describe('renderLabels', () => {
  it('one page per label, each QR code encoding the lot’s page, made once per lot', async () => {
    const spy = jest.spyOn(QRCode, 'toBuffer');
    const pdf = await renderLabels([label(), label({ packText: 'Pack 2 of 2' }), label({ lotId: 'x', url: 'https://potlife.test/stock/lots/x', hazardClass: 'none', materialKind: 'mat' })]);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    expect((pdf.toString('latin1').match(/\/Type \/Page\b(?!s)/g) ?? []).length).toBe(3);
    expect(spy.mock.calls.map((c) => c[0])).toEqual(['https://potlife.test/stock/lots/6f1c2d3e-0000-4000-8000-000000000001', 'https://potlife.test/stock/lots/x']);
    spy.mockRestore();
  });
});
