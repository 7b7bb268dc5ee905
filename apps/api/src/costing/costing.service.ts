import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import {
  choosePacks,
  costFromStock,
  CostedLot,
  Decimal,
  Estimate as Takeoff,
  EstimateLine as TakeoffLine,
  LINE_ROLE_KINDS,
  LineRole,
  MaterialKind,
  Numeric,
  priceEstimate,
  Price,
  roundMoney,
  Unit,
} from '@potlife/domain';
import { EntityManager, In, Repository } from 'typeorm';
import { Material, TrimPiece } from '../catalogue/entities/material.entity';
import { SuppliersService } from '../suppliers/suppliers.service';
import { toStockUnit, UnitContext } from './units';

/** What the catalogue material for a role must be like, beside its kind. */
export interface MatchContext extends UnitContext {
  rollWidthM: string;
  topcoatColour: string | null;
}

/** The cheapest current price of one pack size. */
export interface PackPrice {
  packPrice: string;
  supplierId: string;
  supplierName: string;
  leadTimeDays: number;
}

export interface CostedPack {
  /** supplier: packs at the cheapest current price; stock: what is taken from one lot (size = the quantity, count 1) */
  source: 'supplier' | 'stock';
  size: Decimal;
  label: string;
  count: number;
  price: PackPrice | null;
  /** stock rows: the lot and its cost of one stock unit */
  lot: { id: string; batchNumber: string | null; unitCost: Decimal } | null;
  cost: Decimal | null;
}

/** A lot the job could take, with its batch for the label. */
export interface StockLot extends CostedLot {
  batchNumber: string | null;
}

/**
 * For an estimate on stock cost: the lots each material offers the job (FEFO order, unit cost),
 * and the date they must be in date on (the job date plus the owner's margin).
 */
export type StockOffer = (
  materialIds: string[],
) => Promise<{ useBy: string; lots: ReadonlyMap<string, readonly StockLot[]> }>;

/** Lots hold quantities to 3 decimal places: a need taken from stock is rounded up to them. */
const LOT_PLACES = 3;

/** One material to buy: the take-off lines that map to it, summed in its stock unit, in packs, priced. */
export interface CostedMaterial {
  roles: LineRole[];
  materialKind: MaterialKind;
  material: Material | null;
  /** in the stock unit when there is a material, else the line's unit */
  quantity: Decimal;
  unit: string;
  /** what is costed from lots (estimates on stock cost), in the stock unit */
  stockQuantity: Decimal;
  packs: CostedPack[];
  packTotal: Decimal | null;
  leftover: Decimal | null;
  cost: Decimal | null;
  problem: string | null;
}

export interface CostedTakeoff {
  /** the material each role maps to (null: none in the catalogue) */
  lineMaterials: Map<LineRole, Material | null>;
  materials: CostedMaterial[];
  price: Price;
  unpriced: number;
}

/** A material the role may use, and how well it fits (lower is better). */
type Fit = (m: Material, line: TakeoffLine, ctx: MatchContext) => number | null;

const sameNumber = (a: Numeric | null | undefined, b: Numeric | null | undefined): boolean =>
  a !== null && a !== undefined && b !== null && b !== undefined && new Decimal(a).eq(b);

/** What a trim is, from its catalogue field (a trim without one is a length). */
const pieceOf = (m: Material): TrimPiece => m.trimPiece ?? 'length';

/**
 * How each take-off role finds its catalogue material: by kind and the kind's own fields. A role
 * with several candidates takes the best fit, then the lowest code.
 */
function matchFor(role: LineRole): { fit: Fit; need: string } {
  switch (role) {
    case 'mat':
      return {
        fit: (m, _l, c) =>
          sameNumber(m.matGsm, c.matGsm) ? (sameNumber(m.rollWidthM, c.rollWidthM) ? 0 : 1) : null,
        need: 'a mat of the build-up’s weight',
      };
    case 'base-resin':
    case 'bandage-resin':
      return { fit: () => 0, need: 'a base resin' };
    case 'topcoat':
      return {
        fit: (m, _l, c) =>
          c.topcoatColour === null
            ? 0
            : (m.topcoatColour ?? '').trim().toLowerCase() === c.topcoatColour.trim().toLowerCase()
              ? 0
              : null,
        need: 'a topcoat of the job’s colour',
      };
    case 'catalyst':
      return { fit: () => 0, need: 'a catalyst' };
    case 'trim:drip':
    case 'trim:kerb':
    case 'trim:wall':
    case 'trim:angle': {
      const edge = role.slice(5);
      return {
        fit: (m, _l, c) =>
          m.trimKind === edge && pieceOf(m) === 'length'
            ? sameNumber(m.trimLengthM, c.trimLengthM)
              ? 0
              : 1
            : null,
        need: `a ${edge} trim`,
      };
    }
    case 'corner:external':
    case 'corner:internal': {
      const which = role === 'corner:external' ? 'external' : 'internal';
      return {
        fit: (m) => (pieceOf(m) === `${which}-corner` ? 0 : null),
        need: `an ${which} corner piece (a trim whose piece is “${which} corner”)`,
      };
    }
    case 'outlet':
      return { fit: () => 0, need: 'an outlet piece' };
    case 'bandage':
      return {
        fit: (m, _l, c) => (sameNumber(m.rollWidthM, new Decimal(c.bandageWidthMm).div(1000)) ? 0 : 1),
        need: 'a bandage',
      };
    case 'acetone':
      return { fit: () => 0, need: 'acetone' };
    case 'adhesive':
      return { fit: () => 0, need: 'a trim adhesive' };
    case 'battens':
      return { fit: () => 0, need: 'a batten' };
    case 'nails':
      return { fit: () => 0, need: 'a fixing (clout nails)' };
    default: {
      const never: never = role;
      throw new Error(`unknown line role ${String(never)}`);
    }
  }
}

/** How a role finds its material: of the role's kind (the domain's LINE_ROLE_KINDS), by the best fit. */
function fitFor(role: LineRole): { kind: MaterialKind; fit: Fit; need: string } {
  return { kind: LINE_ROLE_KINDS[role], ...matchFor(role) };
}

@Injectable()
export class CostingService {
  constructor(
    @InjectRepository(Material) private readonly materials: Repository<Material>,
    private readonly suppliers: SuppliersService,
  ) {}

  private async catalogue(companyId: string, kinds: MaterialKind[], m?: EntityManager): Promise<Material[]> {
    const repo = m ? m.getRepository(Material) : this.materials;
    return repo.find({ where: { companyId, active: true, kind: In(kinds) }, order: { code: 'ASC' } });
  }

  /** The material of each role: the caller's choice when given (it must be of the role's kind), else the best fit. */
  async matchMaterials(
    companyId: string,
    lines: readonly TakeoffLine[],
    ctx: MatchContext,
    chosen: ReadonlyMap<LineRole, string> = new Map(),
    m?: EntityManager,
  ): Promise<{ materials: Map<LineRole, Material | null>; problems: Map<LineRole, string> }> {
    const specs = new Map(lines.map((l) => [l.role, fitFor(l.role)]));
    const all = await this.catalogue(companyId, [...new Set([...specs.values()].map((s) => s.kind))], m);
    const materials = new Map<LineRole, Material | null>();
    const problems = new Map<LineRole, string>();
    for (const line of lines) {
      const spec = specs.get(line.role)!;
      const choice = chosen.get(line.role);
      if (choice !== undefined) {
        const found = all.find((x) => x.id === choice && x.kind === spec.kind);
        if (found) {
          materials.set(line.role, found);
          continue;
        }
        problems.set(
          line.role,
          `The material chosen for ${line.role} is not an active ${spec.kind} of this company; the best fit was used.`,
        );
      }
      let best: Material | null = null;
      let bestFit = Number.POSITIVE_INFINITY;
      for (const x of all) {
        if (x.kind !== spec.kind) {
          continue;
        }
        const f = spec.fit(x, line, ctx);
        if (f !== null && f < bestFit) {
          best = x;
          bestFit = f;
        }
      }
      materials.set(line.role, best);
      if (!best) {
        problems.set(
          line.role,
          `No material in the catalogue for ${line.description.toLowerCase()}: add ${spec.need}.`,
        );
      }
    }
    return { materials, problems };
  }

  /**
   * The cheapest current price of each pack size of each material on a date, from
   * SuppliersService (each supplier's price in force on the date, cheapest first), among active
   * suppliers, with the supplier's lead time.
   */
  async currentPrices(
    companyId: string,
    materialIds: string[],
    onDate: string,
    m?: EntityManager,
  ): Promise<Map<string, PackPrice>> {
    const out = new Map<string, PackPrice>();
    if (materialIds.length === 0) {
      return out;
    }
    const prices = (await this.suppliers.currentPrices(companyId, materialIds, onDate, m)).filter(
      (p) => p.supplierActive,
    );
    const ids = [...new Set(prices.map((p) => p.supplierId))];
    const leads: { id: string; lead: number }[] = ids.length
      ? await (m ?? this.materials.manager).query(
          `SELECT id, lead_time_days AS lead FROM suppliers WHERE company_id = $1 AND id = ANY($2)`,
          [companyId, ids],
        )
      : [];
    for (const p of prices) {
      const key = priceKey(p.materialId, p.packSize);
      if (!out.has(key)) {
        out.set(key, {
          packPrice: p.packPrice,
          supplierId: p.supplierId,
          supplierName: p.supplierName,
          leadTimeDays: leads.find((l) => l.id === p.supplierId)?.lead ?? 0,
        });
      }
    }
    return out;
  }

  /**
   * A take-off costed against the catalogue: each line mapped to a material, lines of the same
   * material summed in its stock unit (deck and bandage resin together), packs by choosePacks over
   * the material's pack sizes, each pack at the cheapest current price, then priceEstimate with
   * labour, markup and VAT. Materials with no price are left out of the material cost and counted.
   * With `stock` (an estimate on stock cost), what the job could reserve is taken first by the
   * domain's costFromStock at each lot's own cost, and only the remainder is bought in packs.
   */
  async costTakeoff(
    companyId: string,
    takeoff: Takeoff,
    ctx: MatchContext,
    money: { labourRate: string; markupPct: string; vatRatePct: string },
    onDate: string,
    chosen?: ReadonlyMap<LineRole, string>,
    m?: EntityManager,
    stock?: StockOffer,
  ): Promise<CostedTakeoff> {
    const { materials: lineMaterials, problems } = await this.matchMaterials(
      companyId,
      takeoff.lines,
      ctx,
      chosen,
      m,
    );
    const groups: CostedMaterial[] = [];
    const byMaterial = new Map<string, CostedMaterial>();
    for (const line of takeoff.lines) {
      const material = lineMaterials.get(line.role) ?? null;
      if (!material) {
        groups.push(blank(line, null, line.quantity, line.unit, problems.get(line.role) ?? null));
        continue;
      }
      const converted = toStockUnit(line.quantity, line.unit, material, ctx);
      if (!converted.ok) {
        groups.push(blank(line, material, line.quantity, line.unit, converted.problem));
        continue;
      }
      const group = byMaterial.get(material.id);
      if (group) {
        group.roles.push(line.role);
        group.quantity = group.quantity.plus(converted.quantity);
      } else {
        const g = blank(
          line,
          material,
          converted.quantity,
          material.stockUnit,
          problems.get(line.role) ?? null,
        );
        byMaterial.set(material.id, g);
        groups.push(g);
      }
    }
    const prices = await this.currentPrices(companyId, [...byMaterial.keys()], onDate, m);
    const offer = stock ? await stock([...byMaterial.keys()]) : null;
    for (const g of byMaterial.values()) {
      const material = g.material as Material;
      const sizes = material.packSizes.map((p) => p.size);
      const labelOf = (size: Decimal) =>
        material.packSizes.find((s) => new Decimal(s.size).eq(size))?.label ??
        `${size.toString()} ${material.stockUnit}`;
      const supplierPacks = (packs: { size: Decimal; count: number }[]): CostedPack[] =>
        packs.map((p) => {
          const price = prices.get(priceKey(material.id, p.size.toString())) ?? null;
          return {
            source: 'supplier',
            size: p.size,
            label: labelOf(p.size),
            count: p.count,
            price,
            lot: null,
            cost: price ? roundMoney(new Decimal(price.packPrice).times(p.count)) : null,
          };
        });
      let remainder = g.quantity;
      if (offer) {
        const lots = offer.lots.get(material.id) ?? [];
        const split = costFromStock(
          lots,
          g.quantity.toDecimalPlaces(LOT_PLACES, Decimal.ROUND_UP),
          offer.useBy,
          [],
        );
        g.stockQuantity = split.stockQuantity;
        g.packs = split.fromStock.map((part) => {
          const lot = lots.find((l) => l.id === part.lotId);
          return {
            source: 'stock',
            size: part.quantity,
            label: `From stock, lot ${lot?.batchNumber ?? part.lotId.slice(0, 8)}`,
            count: 1,
            price: null,
            lot: { id: part.lotId, batchNumber: lot?.batchNumber ?? null, unitCost: part.unitCost },
            cost: part.cost,
          };
        });
        remainder = split.remainder;
        g.packTotal = split.stockQuantity;
        g.leftover = split.stockQuantity.minus(g.quantity);
      }
      if (!offer || remainder.gt(0)) {
        if (sizes.length === 0) {
          g.problem = `${material.name} has no pack sizes in the catalogue: add the packs it is bought in.`;
          continue;
        }
        const choice = choosePacks(remainder, sizes);
        g.packTotal = g.stockQuantity.plus(choice.total);
        g.leftover = g.packTotal.minus(g.quantity);
        g.packs.push(...supplierPacks(choice.packs));
      }
      const missing = g.packs.filter((p) => p.source === 'supplier' && p.price === null);
      if (missing.length > 0) {
        g.problem = `No price: no current supplier price for ${missing.map((p) => p.label).join(', ')} of ${material.name}. Add one to the supplier’s price list.`;
      } else {
        g.cost = g.packs.reduce((s, p) => s.plus(p.cost as Decimal), new Decimal(0));
      }
    }
    const priced = groups.filter((g) => g.cost !== null);
    const price = priceEstimate(
      priced.flatMap((g) =>
        g.packs.map((p) =>
          p.lot
            ? { quantity: p.size, unitCost: p.lot.unitCost }
            : { quantity: p.count, unitCost: (p.price as PackPrice).packPrice },
        ),
      ),
      takeoff.labour.totalHours,
      money.labourRate,
      money.markupPct,
      money.vatRatePct,
    );
    return { lineMaterials, materials: groups, price, unpriced: groups.length - priced.length };
  }
}

function blank(
  line: TakeoffLine,
  material: Material | null,
  quantity: Decimal,
  unit: Unit | string,
  problem: string | null,
): CostedMaterial {
  return {
    roles: [line.role],
    materialKind: line.material,
    material,
    quantity,
    unit,
    stockQuantity: new Decimal(0),
    packs: [],
    packTotal: null,
    leftover: null,
    cost: null,
    problem,
  };
}

/** Pack sizes compare as numbers: "25" and "25.000" are one size. */
export function priceKey(materialId: string, packSize: string): string {
  return `${materialId}|${new Decimal(packSize).toString()}`;
}
