import { unexpected } from './errors';
import { MaterialKind } from './materials';

/** The hazards Potlife warns of where they apply. */
export type CautionId = 'work-at-height' | 'styrene-vapour' | 'catalyst' | 'flammable' | 'dust';

export interface Caution {
  id: CautionId;
  title: string;
  text: string;
}

const DEFER = 'Always follow the safety data sheet, local codes and licensed practice.';

/** Every caution, in the order they are shown. Texts from TRADE.md "Cautions"; each defers to the SDS, local codes and licensed practice. */
export const CAUTIONS: readonly Caution[] = Object.freeze([
  {
    id: 'work-at-height',
    title: 'Work at height and open roof edges',
    text:
      'A flat roof has open edges. Put edge protection or a scaffold with guard rails in place before work starts, ' +
      'keep materials and offcuts back from the edge, and take care at rooflights and openings. ' +
      'Follow local codes and licensed practice for work at height, and the safety data sheet of each material used.',
  },
  {
    id: 'styrene-vapour',
    title: 'Styrene vapour',
    text:
      'Base resin and topcoat give off styrene vapour. Keep air moving through the work area, wear an organic-vapour ' +
      'respirator where vapour builds up, with chemical-resistant gloves and eye protection, and keep lids on tins. ' +
      DEFER,
  },
  {
    id: 'catalyst',
    title: 'Catalyst (organic peroxide)',
    text:
      'Catalyst is an organic peroxide and is corrosive to the eyes: wear eye protection and gloves when measuring it. ' +
      'Never mix it directly with accelerator, keep it in its original container away from heat and flammables, ' +
      'and soak up spills with an inert absorbent such as dry sand, never rags or sawdust. ' +
      DEFER,
  },
  {
    id: 'flammable',
    title: 'Flammable liquids',
    text:
      'Acetone, resin and topcoat are flammable (acetone flashes at about −20 °C). No smoking, flames or hot work nearby, ' +
      'keep containers closed, and bring to the roof only what the day needs. ' +
      DEFER,
  },
  {
    id: 'dust',
    title: 'Grinding and sanding dust',
    text:
      'Cutting, grinding and sanding laminate and trims makes fine glass and resin dust. Use dust extraction where you can, ' +
      'wear a suitable dust mask, eye protection and gloves, and clear up with a vacuum rather than a brush. ' +
      DEFER,
  },
]);

/** The cautions one material needs. Every material goes onto a roof, so work at height comes with all of them. */
export function cautionIdsFor(kind: MaterialKind): CautionId[] {
  switch (kind) {
    case 'base-resin':
    case 'topcoat':
      return ['work-at-height', 'styrene-vapour', 'flammable'];
    case 'catalyst':
      return ['work-at-height', 'catalyst'];
    case 'acetone':
      return ['work-at-height', 'flammable'];
    case 'mat':
    case 'bandage':
    case 'trim':
      return ['work-at-height', 'dust'];
    case 'outlet':
    case 'adhesive':
    case 'batten':
    case 'fixing':
    case 'other':
      return ['work-at-height'];
    default:
      return unexpected('material kind', kind);
  }
}

/** The cautions for a set of materials (a pick list, an estimate), each once, in a fixed order. */
export function cautionsFor(materialKinds: readonly MaterialKind[]): Caution[] {
  const ids = new Set<CautionId>();
  for (const kind of materialKinds) {
    for (const id of cautionIdsFor(kind)) {
      ids.add(id);
    }
  }
  return CAUTIONS.filter((c) => ids.has(c.id));
}
