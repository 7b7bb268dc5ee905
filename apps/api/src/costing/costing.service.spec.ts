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
});
