import { Decimal, estimateRoof } from '@potlife/domain';
import type { Material } from '../catalogue/entities/material.entity';
import { CostingService } from './costing.service';

const material = (over: Partial<Material>): Material =>
  ({
    id: over.code ?? 'x',
    companyId: 'c',
    name: 'X',
    stockUnit: 'each',
    packSizes: [{ size: '1', label: 'piece' }],
    matGsm: null,
    rollWidthM: null,
    trimKind: null,
    trimLengthM: null,
    topcoatColour: null,
    litresPerKg: null,
    active: true,
    ...over,
  }) as Material;

const catalogue = [
  material({
    code: 'MAT-300',
    kind: 'mat',
    name: 'Mat 300',
    matGsm: 300,
    stockUnit: 'm2',
    packSizes: [{ size: '66.56', label: 'roll' }],
  }),
  material({
    code: 'MAT-450',
    kind: 'mat',
    name: 'Mat 450',
    matGsm: 450,
    stockUnit: 'm2',
    rollWidthM: '1.04',
    packSizes: [{ size: '66.56', label: 'roll' }],
  }),
  material({
    code: 'TOP-GRY',
    kind: 'topcoat',
    name: 'Topcoat grey',
    topcoatColour: 'Slate grey',
    stockUnit: 'kg',
  }),
  material({
    code: 'TOP-GRN',
    kind: 'topcoat',
    name: 'Topcoat green',
    topcoatColour: 'Moss green',
    stockUnit: 'kg',
  }),
  // Corner pieces are told by their catalogue field, not their names: these names say nothing of
  // corners, and the drip length below says "corner" but is a length.
  material({
    code: 'CRN-EXT',
    kind: 'trim',
    name: 'Drip piece, outside',
    trimKind: 'drip',
    trimLengthM: '0.3',
    trimPiece: 'external-corner',
  }),
  material({
    code: 'CRN-INT',
    kind: 'trim',
    name: 'Drip piece, inside',
    trimKind: 'drip',
    trimLengthM: '0.3',
    trimPiece: 'internal-corner',
  }),
  material({
    code: 'TRM-DRIP',
    kind: 'trim',
    name: 'Drip trim for corners and runs, 3 m',
    trimKind: 'drip',
    trimLengthM: '3',
    trimPiece: 'length',
  }),
];

describe('CostingService.matchMaterials', () => {
  const repo = {
    find: jest.fn(({ where }: { where: { kind: { _value: string[] } } }) =>
      Promise.resolve(catalogue.filter((m) => where.kind._value.includes(m.kind))),
    ),
  };
  const costing = new CostingService(repo as never, {} as never);
  const takeoff = estimateRoof({
    areas: [{ name: 'A', lengthM: 4, widthM: 3 }],
    edges: [
      { kind: 'drip', lengthM: 4 },
      { kind: 'drip', lengthM: 3 },
    ],
    corners: { external: 2, internal: 1 },
  });
  const ctx = {
    matGsm: '450',
    rollWidthM: '1',
    bandageWidthMm: '100',
    bandageGsm: '450',
    trimLengthM: '3',
    topcoatColour: 'slate GREY',
  };

  it('maps each role by kind and kind-specific fields (common trade practice, no source)', async () => {
    const { materials, problems } = await costing.matchMaterials('c', takeoff.lines, ctx);
    expect(materials.get('mat')?.code).toBe('MAT-450');
    expect(materials.get('topcoat')?.code).toBe('TOP-GRY');
    expect(materials.get('trim:drip')?.code).toBe('TRM-DRIP');
    expect(materials.get('corner:external')?.code).toBe('CRN-EXT');
    expect(materials.get('corner:internal')?.code).toBe('CRN-INT');
    expect(materials.get('base-resin')).toBeNull();
    expect(problems.get('base-resin')).toContain('add a base resin');
  });

  it('takes a chosen material of the right kind, and says when a choice is not one', async () => {
    const chosen = new Map([
      ['topcoat', 'TOP-GRN'],
      ['mat', 'TOP-GRN'],
    ] as const);
    const { materials, problems } = await costing.matchMaterials('c', takeoff.lines, ctx, chosen);
    expect(materials.get('topcoat')?.code).toBe('TOP-GRN');
    expect(materials.get('mat')?.code).toBe('MAT-450');
    expect(problems.get('mat')).toContain('not an active mat');
    expect(new Decimal(takeoff.deckAreaM2).toString()).toBe('12'); // 4 × 3 (arithmetic)
  });

  it('on stock cost takes what the lots cover at their cost and buys only the rest (costFromStock)', async () => {
    const suppliers = { currentPrices: jest.fn().mockResolvedValue([]) };
    const withStock = new CostingService(repo as never, suppliers as never);
    const offer = jest.fn().mockResolvedValue({
      useBy: '2027-01-10',
      lots: new Map([
        // invented: 5 drip lengths in stock at £9.50; a flagged lot of corner pieces is not offered
        ['TRM-DRIP', [{ id: 'lot-d', quantity: '5', expiresOn: '9999-12-31', usable: true, unitCost: '9.5', batchNumber: 'D-1' }]],
        ['CRN-EXT', [{ id: 'lot-c', quantity: '10', expiresOn: '9999-12-31', usable: false, unitCost: '1', batchNumber: 'C-1' }]],
      ]),
    });
    const costed = await withStock.costTakeoff(
      'c',
      takeoff,
      ctx,
      { labourRate: '0', markupPct: '0', vatRatePct: '20' },
      '2026-12-01',
      undefined,
      undefined,
      offer,
    );
    const drip = costed.materials.find((g) => g.material?.code === 'TRM-DRIP')!;
    // Drip runs of 4 m and 3 m in 3 m lengths lapped 50 mm: 2 + 1 = 3 lengths (domain trimLengthsForRun),
    // all from lot D-1: 3 × £9.50 = £28.50, nothing bought.
    expect(drip.stockQuantity.toString()).toBe('3');
    expect(drip.packs.map((p) => [p.source, p.size.toString(), p.cost?.toString()])).toEqual([['stock', '3', '28.5']]);
    expect(drip.cost?.toString()).toBe('28.5');
    // The corner pieces' only lot is unusable: both are bought, and no supplier price is known.
    const corner = costed.materials.find((g) => g.material?.code === 'CRN-EXT')!;
    expect(corner.stockQuantity.toString()).toBe('0');
    expect(corner.packs.map((p) => [p.source, p.count])).toEqual([['supplier', 2]]);
    expect(corner.problem).toContain('No price');
    // priceEstimate over the priced stock rows only (labour 0, markup 0): £28.50.
    expect(costed.price.materialCost.toString()).toBe('28.5');
    expect(offer).toHaveBeenCalledWith(expect.arrayContaining(['TRM-DRIP', 'CRN-EXT']));
  });
});
