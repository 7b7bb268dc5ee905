import {
  checkFlammablesCapacity,
  checkSegregation,
  Decimal,
  FLAMMABLES_WORKROOM_LIMIT_L,
  HazardClass,
} from '@potlife/domain';
import type { LocationKind } from './entities/location.entity';

/** A location as placement rules see it. */
export interface PlaceNode {
  id: string;
  name: string;
  kind: LocationKind;
  parentId: string | null;
  capacityLitres: string | null;
  allowedHazardClasses: HazardClass[];
  active: boolean;
}

/** What placement rules need to know of a material. */
export interface PlacedMaterial {
  name: string;
  hazardClass: HazardClass;
  isAccelerator: boolean;
  stockUnit: string;
  litresPerKg: string | null;
}

/** Stock present in a location: one lot's quantity there. */
export interface Present {
  lotId: string;
  locationId: string;
  quantity: Decimal;
  material: PlacedMaterial;
}

/** Stock about to be put somewhere. */
export interface Put {
  lotId: string;
  locationId: string;
  quantity: Decimal;
  material: PlacedMaterial;
}

/** A refusal, with a message citing the rule, or nothing. */
export type PlacementOutcome = { ok: true; warnings: string[] } | { ok: false; code: string; message: string };

/** Bays and shelves are open parts of the place they are in; every other kind is a place of its own (its own walls, doors or barrier). */
const OPEN_KINDS: readonly LocationKind[] = ['bay', 'shelf'];

/**
 * The zone a location belongs to for segregation and capacity: the nearest location, itself or
 * above it, that is not a bay or shelf; with every bay and shelf inside it. A flammables cabinet
 * or peroxide store inside the main store is a zone of its own.
 */
export function zoneRoot(id: string, nodes: ReadonlyMap<string, PlaceNode>): PlaceNode {
  let node = nodes.get(id);
  if (!node) {
    throw new Error(`unknown location ${id}`);
  }
  const seen = new Set<string>();
  while (OPEN_KINDS.includes(node.kind) && node.parentId && !seen.has(node.id)) {
    seen.add(node.id);
    const parent = nodes.get(node.parentId);
    if (!parent) {
      break;
    }
    node = parent;
  }
  return node;
}

/** The ids of a zone: its root and the bays and shelves inside it (through bays and shelves only). */
export function zoneMembers(root: PlaceNode, nodes: ReadonlyMap<string, PlaceNode>): Set<string> {
  const members = new Set<string>([root.id]);
  let grew = true;
  while (grew) {
    grew = false;
    for (const n of nodes.values()) {
      if (!members.has(n.id) && n.parentId && members.has(n.parentId) && OPEN_KINDS.includes(n.kind)) {
        members.add(n.id);
        grew = true;
      }
    }
  }
  return members;
}

/** The classes a material counts as for segregation: accelerators are kept as class 3 (domain HazardClass). */
export function segregationClasses(m: PlacedMaterial): HazardClass[] {
  return m.isAccelerator && m.hazardClass !== '3' ? [m.hazardClass, '3'] : [m.hazardClass];
}

export function classLabel(c: HazardClass): string {
  return c === 'none' ? 'not a dangerous good' : `class ${c}`;
}

/**
 * Litres a quantity of a flammable liquid takes in a cabinet. Litres as stocked; kilograms through
 * the material's litres per kg, or 1 L per kg when it is not set (resin and topcoat are a little
 * denser than water, so this over-counts, on the safe side). Null when the unit cannot be litres.
 */
export function litresOf(quantity: Decimal, m: PlacedMaterial): { litres: Decimal | null; note?: string } {
  if (m.stockUnit === 'L') {
    return { litres: quantity };
  }
  if (m.stockUnit === 'kg') {
    if (m.litresPerKg) {
      return { litres: quantity.times(m.litresPerKg) };
    }
    return { litres: quantity, note: `${m.name} has no litres per kg set, so 1 L per kg was counted` };
  }
  return { litres: null, note: `${m.name} is stocked by ${m.stockUnit}, so its litres cannot be counted against the cabinet` };
}

/** Only class 3 liquids count against a flammables cabinet. Every class 3 material counts, whatever its flash point (on the safe side). */
export function countsAgainstCabinet(m: PlacedMaterial): boolean {
  return m.hazardClass === '3';
}

/**
 * Whether `puts` may go where they are going, one after another (a later put sees the earlier
 * ones), given what is `present`: the location must be in use and allow the material's hazard
 * class; no class 5.2 with class 3 (or an accelerator) in the same zone (domain checkSegregation,
 * HSE CS21 / NFPA 400); a flammables cabinet may not go past its capacity (domain
 * checkFlammablesCapacity, HSE HSG51), and warns when nearly full.
 */
export function checkPlacement(puts: readonly Put[], present: readonly Present[], nodes: ReadonlyMap<string, PlaceNode>): PlacementOutcome {
  const state: Present[] = present.filter((p) => p.quantity.gt(0));
  const warnings: string[] = [];
  for (const put of puts) {
    const dest = nodes.get(put.locationId);
    if (!dest) {
      return { ok: false, code: 'not_found', message: 'Location not found' };
    }
    if (!dest.active) {
      return { ok: false, code: 'location_inactive', message: `${dest.name} is no longer in use: choose another location.` };
    }
    const cls = put.material.hazardClass;
    if (!dest.allowedHazardClasses.includes(cls)) {
      const allowed = dest.allowedHazardClasses.length ? dest.allowedHazardClasses.map(classLabel).join(', ') : 'nothing';
      return {
        ok: false,
        code: 'hazard_class_not_allowed',
        message: `${put.material.name} (${classLabel(cls)}) may not be stored in ${dest.name}, which may hold: ${allowed}. Choose another location, or change what ${dest.name} may hold.`,
      };
    }
    const root = zoneRoot(dest.id, nodes);
    const members = zoneMembers(root, nodes);
    const here = state.filter((p) => members.has(p.locationId) && p.lotId !== put.lotId && p.quantity.gt(0));
    const presentClasses = [...new Set(here.flatMap((p) => segregationClasses(p.material)))];
    for (const c of segregationClasses(put.material)) {
      const seg = checkSegregation(c, presentClasses);
      if (!seg.ok) {
        const where = root.id === dest.id ? dest.name : `${dest.name} (in ${root.name})`;
        const names = [...new Set(here.filter((p) => segregationClasses(p.material).some((x) => seg.conflictsWith.includes(x))).map((p) => p.material.name))];
        return {
          ok: false,
          code: 'segregation',
          message: `${put.material.name} cannot go to ${where}, which holds ${names.join(', ')}. ${seg.message}`,
        };
      }
    }
    if (root.kind === 'flammables-cabinet' && countsAgainstCabinet(put.material)) {
      let current = new Decimal(0);
      for (const p of state.filter((x) => members.has(x.locationId) && countsAgainstCabinet(x.material))) {
        const l = litresOf(p.quantity, p.material);
        if (l.litres) {
          current = current.plus(l.litres);
        }
      }
      const add = litresOf(put.quantity, put.material);
      if (add.note) {
        warnings.push(add.note);
      }
      const cap = checkFlammablesCapacity(current, add.litres ?? 0, root.capacityLitres ?? FLAMMABLES_WORKROOM_LIMIT_L);
      if (cap.level === 'refused') {
        return { ok: false, code: 'flammables_capacity', message: `${root.name}: ${cap.message}` };
      }
      if (cap.level === 'warning') {
        warnings.push(`${root.name}: ${cap.message}`);
      }
    }
    const same = state.find((p) => p.lotId === put.lotId && p.locationId === put.locationId);
    if (same) {
      same.quantity = same.quantity.plus(put.quantity);
    } else {
      state.push({ ...put });
    }
  }
  return { ok: true, warnings: [...new Set(warnings)] };
}

/** A place where incompatible classes are stored together, or a class is kept where it is not allowed. */
export interface SegregationProblem {
  locationId: string;
  locationName: string;
  classes: HazardClass[];
  materials: string[];
  message: string;
}

/** Every zone holding classes that may not be together, and every location holding a class it may not hold. */
export function findSegregationProblems(present: readonly Present[], nodes: ReadonlyMap<string, PlaceNode>): SegregationProblem[] {
  const problems: SegregationProblem[] = [];
  const byRoot = new Map<string, Present[]>();
  for (const p of present.filter((x) => x.quantity.gt(0))) {
    if (!nodes.has(p.locationId)) {
      continue;
    }
    const root = zoneRoot(p.locationId, nodes);
    byRoot.set(root.id, [...(byRoot.get(root.id) ?? []), p]);
    const loc = nodes.get(p.locationId)!;
    if (!loc.allowedHazardClasses.includes(p.material.hazardClass)) {
      problems.push({
        locationId: loc.id,
        locationName: loc.name,
        classes: [p.material.hazardClass],
        materials: [p.material.name],
        message: `${loc.name} holds ${p.material.name} (${classLabel(p.material.hazardClass)}), which it may not hold: move it, or change what ${loc.name} may hold.`,
      });
    }
  }
  for (const [rootId, items] of byRoot) {
    const root = nodes.get(rootId)!;
    const classes = [...new Set(items.flatMap((p) => segregationClasses(p.material)))];
    for (const c of classes) {
      const seg = checkSegregation(c, classes.filter((x) => x !== c));
      if (!seg.ok) {
        const involved = [c, ...seg.conflictsWith].sort();
        problems.push({
          locationId: root.id,
          locationName: root.name,
          classes: involved,
          materials: [...new Set(items.filter((p) => segregationClasses(p.material).some((x) => involved.includes(x))).map((p) => p.material.name))].sort(),
          message: `${root.name}: ${seg.message}`,
        });
        break;
      }
    }
  }
  return dedupeProblems(problems);
}

function dedupeProblems(problems: SegregationProblem[]): SegregationProblem[] {
  const seen = new Set<string>();
  return problems.filter((p) => {
    const key = `${p.locationId}:${p.classes.join(',')}:${p.materials.join(',')}`;
    if (seen.has(key)) {
      return false;
    }
    seen.add(key);
    return true;
  });
}
