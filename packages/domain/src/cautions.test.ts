import { describe, expect, it } from 'vitest';
import { CAUTIONS, CautionId, cautionsFor } from './cautions';
import { MATERIAL_KINDS, MaterialKind } from './materials';

describe('cautionsFor', () => {
  it.each<[MaterialKind[], CautionId[]]>([
    [[], []],
    [['base-resin'], ['work-at-height', 'styrene-vapour', 'flammable']],
    [['topcoat'], ['work-at-height', 'styrene-vapour', 'flammable']],
    [['catalyst'], ['work-at-height', 'catalyst']],
    [['acetone'], ['work-at-height', 'flammable']],
    [['mat'], ['work-at-height', 'dust']],
    [['trim', 'bandage'], ['work-at-height', 'dust']],
    [['batten', 'fixing', 'adhesive', 'outlet'], ['work-at-height']],
    [['acetone', 'catalyst', 'base-resin', 'acetone'], ['work-at-height', 'styrene-vapour', 'catalyst', 'flammable']],
    [[...MATERIAL_KINDS], ['work-at-height', 'styrene-vapour', 'catalyst', 'flammable', 'dust']],
  ])('%j → %j', (kinds, ids) => {
    expect(cautionsFor(kinds).map((c) => c.id)).toEqual(ids);
  });

  it.each(CAUTIONS.map((c) => [c.id, c.text]))('%s defers to the safety data sheet, local codes and licensed practice', (_id, text) => {
    expect(text).toMatch(/safety data sheet/);
    expect(text).toMatch(/local codes/);
    expect(text).toMatch(/licensed practice/);
    expect(text.trim().endsWith('.')).toBe(true);
  });

  it.each([
    ['catalyst', /never mix it directly with accelerator/i], // TRADE.md cautions
    ['flammable', /−20 °C/], // acetone flash point about −20 °C: ILO ICSC 0087
    ['work-at-height', /edge protection/],
    ['styrene-vapour', /organic-vapour respirator/],
    ['dust', /dust/],
  ])('the %s caution says %s', (id, pattern) => {
    expect(CAUTIONS.find((c) => c.id === id)?.text).toMatch(pattern);
  });

  it('refuses a material it does not know', () => {
    expect(() => cautionsFor(['glitter' as MaterialKind])).toThrow(/Unknown material kind/);
  });
});
