import { Decimal, HazardClass } from '@potlife/domain';
import { zoneMembers, zoneRoot, checkPlacement, findSegregationProblems, litresOf, PlaceNode, Present, PlacedMaterial } from './placement';

const node = (id: string, kind: PlaceNode['kind'], parentId: string | null = null, allowed: HazardClass[] = ['none', '3', '5.2'], capacityLitres: string | null = null): PlaceNode => ({
  id,
  name: id,
  kind,
  parentId,
  capacityLitres,
  allowedHazardClasses: allowed,
  active: true,
});
const nodes = new Map(
  [
    node('store', 'store'),
    node('bay', 'bay', 'store'),
    node('shelf', 'shelf', 'bay'),
    node('cab', 'flammables-cabinet', 'store', ['3'], '50'),
    node('cabShelf', 'shelf', 'cab', ['3']),
    node('perox', 'peroxide-store', 'store', ['5.2']),
  ].map((n) => [n.id, n]),
);
const resin: PlacedMaterial = { name: 'resin', hazardClass: '3', isAccelerator: false, stockUnit: 'kg', litresPerKg: '0.9' };
const acetone: PlacedMaterial = { name: 'acetone', hazardClass: '3', isAccelerator: false, stockUnit: 'L', litresPerKg: null };
const catalyst: PlacedMaterial = { name: 'catalyst', hazardClass: '5.2', isAccelerator: false, stockUnit: 'kg', litresPerKg: null };
const at = (lotId: string, locationId: string, q: string, material: PlacedMaterial): Present => ({ lotId, locationId, quantity: new Decimal(q), material });

describe('zones', () => {
  it.each([
    ['shelf', 'store'],
    ['bay', 'store'],
    ['store', 'store'],
    ['cabShelf', 'cab'],
    ['perox', 'perox'],
  ])('%s belongs to the zone of %s', (id, root) => {
    expect(zoneRoot(id, nodes).id).toBe(root);
  });

  it('a zone is its root with the bays and shelves inside it, not the cabinets and stores', () => {
    expect([...zoneMembers(nodes.get('store')!, nodes)].sort()).toEqual(['bay', 'shelf', 'store']);
    expect([...zoneMembers(nodes.get('cab')!, nodes)].sort()).toEqual(['cab', 'cabShelf']);
  });
});

describe('checkPlacement', () => {
  it('refuses 5.2 beside 3 anywhere in one zone, citing HSE CS21 / NFPA 400', () => {
    const out = checkPlacement([{ lotId: 'c', locationId: 'shelf', quantity: new Decimal(1), material: catalyst }], [at('r', 'bay', '20', resin)], nodes);
    expect(out.ok).toBe(false);
    expect(!out.ok && out.message).toMatch(/catalyst cannot go to shelf \(in store\), which holds resin\. .*HSE CS21; NFPA 400/);
  });

  it('lets catalyst into its own store inside the main store', () => {
    expect(checkPlacement([{ lotId: 'c', locationId: 'perox', quantity: new Decimal(1), material: catalyst }], [at('r', 'bay', '20', resin)], nodes)).toEqual({ ok: true, warnings: [] });
  });

  it('counts an accelerator as class 3', () => {
    const acc: PlacedMaterial = { name: 'accelerator', hazardClass: 'none', isAccelerator: true, stockUnit: 'L', litresPerKg: null };
    const out = checkPlacement([{ lotId: 'c', locationId: 'store', quantity: new Decimal(1), material: catalyst }], [at('a', 'store', '1', acc)], nodes);
    expect(out.ok).toBe(false);
  });

  it.each([
    // HSE HSG51: 50 L; warning from 90 % (Potlife's own)
    ['44.9', 'ok'],
    ['45', 'warning'],
    ['50', 'warning'],
    ['50.001', 'refused'],
  ])('a cabinet of 50 L taking %s L of acetone is %s', (add, level) => {
    const out = checkPlacement([{ lotId: 'x', locationId: 'cabShelf', quantity: new Decimal(add), material: acetone }], [], nodes);
    if (level === 'refused') {
      expect(out.ok).toBe(false);
    } else {
      expect(out.ok).toBe(true);
      expect(out.ok && out.warnings.length).toBe(level === 'warning' ? 1 : 0);
    }
  });

  it('counts kilograms through litres per kg, and 1 L per kg (with a note) when unset', () => {
    expect(litresOf(new Decimal(20), resin).litres!.toString()).toBe('18');
    const unset = litresOf(new Decimal(20), { ...resin, litresPerKg: null });
    expect(unset.litres!.toString()).toBe('20');
    expect(unset.note).toMatch(/1 L per kg/);
    expect(litresOf(new Decimal(2), { ...resin, stockUnit: 'each' }).litres).toBeNull();
  });

  it('sees earlier puts of the same operation and stock leaving in it', () => {
    const out = checkPlacement(
      [
        { lotId: 'a', locationId: 'cab', quantity: new Decimal(30), material: acetone },
        { lotId: 'b', locationId: 'cab', quantity: new Decimal(30), material: acetone },
      ],
      [],
      nodes,
    );
    expect(out.ok).toBe(false);
    // the same lot moving within the cabinet: what leaves is not there any more
    expect(checkPlacement([{ lotId: 'a', locationId: 'cabShelf', quantity: new Decimal(40), material: acetone }], [at('a', 'cab', '0', acetone)], nodes).ok).toBe(true);
  });

  it('refuses a class the location may not hold, and a location out of use', () => {
    expect(checkPlacement([{ lotId: 'c', locationId: 'cab', quantity: new Decimal(1), material: catalyst }], [], nodes)).toMatchObject({ ok: false, code: 'hazard_class_not_allowed' });
    const closed = new Map(nodes);
    closed.set('bay', { ...nodes.get('bay')!, active: false });
    expect(checkPlacement([{ lotId: 'c', locationId: 'bay', quantity: new Decimal(1), material: resin }], [], closed)).toMatchObject({ ok: false, code: 'location_inactive' });
  });
});

describe('findSegregationProblems', () => {
  it('lists a zone holding 3 and 5.2 once, and a class kept where it is not allowed', () => {
    const problems = findSegregationProblems([at('r', 'bay', '20', resin), at('c', 'shelf', '1', catalyst), at('c2', 'cab', '1', catalyst)], nodes);
    expect(problems.map((p) => [p.locationName, p.classes])).toEqual([
      ['cab', ['5.2']],
      ['store', ['3', '5.2']],
    ]);
  });
});
