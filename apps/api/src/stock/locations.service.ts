import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Decimal, FLAMMABLES_WORKROOM_LIMIT_L, HazardClass } from '@potlife/domain';
import { DataSource, EntityManager, QueryFailedError } from 'typeorm';
import type { AuthUser } from '../common/current-user';
import { RuleViolation } from '../common/http-exception.filter';
import { Location, LocationKind } from './entities/location.entity';
import { CreateLocationDto, LocationResponse, UpdateLocationDto } from './dto/location.dto';
import { LedgerService } from './ledger.service';
import { zoneMembers, classLabel, countsAgainstCabinet, litresOf, Present } from './placement';

/**
 * What each kind may hold unless the owner or storeman says otherwise: catalyst (5.2) only in the
 * peroxide store, flammable liquids (3) in stores, bays, shelves, cabinets and vans, nothing
 * dangerous outdoors. HSE CS21 keeps organic peroxide in a store of its own.
 */
export const DEFAULT_ALLOWED_CLASSES: Record<LocationKind, HazardClass[]> = {
  store: ['none', '3'],
  bay: ['none', '3'],
  shelf: ['none', '3'],
  'flammables-cabinet': ['3'],
  'peroxide-store': ['5.2'],
  van: ['none', '3'],
  outdoor: ['none'],
};

interface LocationListRow {
  id: string;
  name: string;
  kind: LocationKind;
  parentId: string | null;
  capacityLitres: string | null;
  allowedHazardClasses: HazardClass[];
  active: boolean;
  notes: string | null;
  createdAt: Date;
  updatedAt: Date;
}

@Injectable()
export class LocationsService {
  constructor(
    @InjectDataSource() private readonly db: DataSource,
    private readonly ledger: LedgerService,
  ) {}

  async list(companyId: string, m: EntityManager = this.db.manager): Promise<LocationResponse[]> {
    const rows: LocationListRow[] = await m.query(
      `SELECT id, name, kind, parent_id AS "parentId", capacity_litres::text AS "capacityLitres", allowed_hazard_classes AS "allowedHazardClasses",
              active, notes, created_at AS "createdAt", updated_at AS "updatedAt"
         FROM locations WHERE company_id = $1`,
      [companyId],
    );
    const present = await this.ledger.presentAt(m, companyId, 'all');
    const byId = new Map(rows.map((r) => [r.id, r]));
    const nodes = await this.ledger.allLocations(m, companyId);
    const pathOf = (r: LocationListRow): string => {
      const names: string[] = [];
      const seen = new Set<string>();
      let cur: LocationListRow | undefined = r;
      while (cur && !seen.has(cur.id)) {
        seen.add(cur.id);
        names.unshift(cur.name);
        cur = cur.parentId ? byId.get(cur.parentId) : undefined;
      }
      return names.join(' › ');
    };
    return rows
      .map((r) => {
        const here = present.filter((p) => p.locationId === r.id);
        let litresHeld: string | null = null;
        if (r.kind === 'flammables-cabinet') {
          const members = zoneMembers(nodes.get(r.id)!, nodes);
          litresHeld = cabinetLitres(present.filter((p) => members.has(p.locationId))).toFixed(3);
        }
        return {
          id: r.id,
          name: r.name,
          kind: r.kind,
          parentId: r.parentId,
          parentName: r.parentId ? (byId.get(r.parentId)?.name ?? null) : null,
          path: pathOf(r),
          capacityLitres: r.capacityLitres,
          allowedHazardClasses: r.allowedHazardClasses,
          active: r.active,
          notes: r.notes,
          lotCount: new Set(here.map((p) => p.lotId)).size,
          hazardClassesStored: [...new Set(here.map((p) => p.material.hazardClass))].sort(),
          litresHeld,
          createdAt: r.createdAt.toISOString(),
          updatedAt: r.updatedAt.toISOString(),
        };
      })
      .sort((a, b) => a.path.localeCompare(b.path));
  }

  async get(companyId: string, id: string, m: EntityManager = this.db.manager): Promise<LocationResponse> {
    const found = (await this.list(companyId, m)).find((l) => l.id === id);
    if (!found) {
      throw new NotFoundException('Location not found');
    }
    return found;
  }

  async create(user: AuthUser, dto: CreateLocationDto): Promise<LocationResponse> {
    return this.db.transaction(async (m) => {
      if (dto.parentId) {
        await this.requireParent(m, user.companyId, dto.parentId);
      }
      const capacity = this.capacityFor(dto.kind, dto.capacityLitres);
      const repo = m.getRepository(Location);
      const saved = await this.saveUnique(() =>
        repo.save(
          repo.create({
            companyId: user.companyId,
            name: dto.name,
            kind: dto.kind,
            parentId: dto.parentId ?? null,
            capacityLitres: capacity,
            allowedHazardClasses: dto.allowedHazardClasses ? [...new Set(dto.allowedHazardClasses)] : DEFAULT_ALLOWED_CLASSES[dto.kind],
            active: true,
            notes: dto.notes ?? null,
          }),
        ),
      dto.name);
      return this.get(user.companyId, saved.id, m);
    });
  }

  async update(user: AuthUser, id: string, dto: UpdateLocationDto): Promise<LocationResponse> {
    return this.db.transaction(async (m) => {
      const repo = m.getRepository(Location);
      const loc = await repo.findOne({ where: { id, companyId: user.companyId }, lock: { mode: 'pessimistic_write' } });
      if (!loc) {
        throw new NotFoundException('Location not found');
      }
      const kind = dto.kind ?? loc.kind;
      if (dto.parentId !== undefined) {
        if (dto.parentId !== null) {
          await this.requireParent(m, user.companyId, dto.parentId);
          await this.refuseCycle(m, user.companyId, id, dto.parentId);
        }
        loc.parentId = dto.parentId;
      }
      if (dto.kind !== undefined || dto.capacityLitres !== undefined) {
        loc.capacityLitres = this.capacityFor(kind, dto.capacityLitres === undefined ? (loc.capacityLitres ?? undefined) : (dto.capacityLitres ?? undefined));
      }
      loc.kind = kind;
      if (dto.name !== undefined) {
        loc.name = dto.name;
      }
      if (dto.notes !== undefined) {
        loc.notes = dto.notes === null ? null : dto.notes.trim() || null;
      }
      const present = await this.ledger.presentAt(m, user.companyId, [id]);
      if (dto.allowedHazardClasses !== undefined) {
        const allowed = [...new Set(dto.allowedHazardClasses)];
        const misfits = present.filter((p) => !allowed.includes(p.material.hazardClass));
        if (misfits.length > 0) {
          const names = [...new Set(misfits.map((p) => `${p.material.name} (${classLabel(p.material.hazardClass)})`))].join(', ');
          throw new RuleViolation(`${loc.name} holds ${names}: move it elsewhere before it stops allowing that class.`, 'hazard_class_in_use');
        }
        loc.allowedHazardClasses = allowed;
      }
      if (dto.active === false && present.length > 0) {
        throw new RuleViolation(`${loc.name} still holds stock (${present.length} lot${present.length === 1 ? '' : 's'}): move it before taking the location out of use.`, 'location_in_use');
      }
      if (dto.active !== undefined) {
        loc.active = dto.active;
      }
      await this.saveUnique(() => repo.save(loc), loc.name);
      if (loc.kind === 'flammables-cabinet') {
        const nodes = await this.ledger.allLocations(m, user.companyId);
        const members = zoneMembers(nodes.get(loc.id)!, nodes);
        const held = cabinetLitres(await this.ledger.presentAt(m, user.companyId, [...members]));
        if (held.gt(loc.capacityLitres ?? FLAMMABLES_WORKROOM_LIMIT_L)) {
          throw new RuleViolation(
            `${loc.name} already holds ${held.toString()} L of flammable liquid, more than ${loc.capacityLitres} L: move some out first (HSE HSG51).`,
            'flammables_capacity',
          );
        }
      }
      return this.get(user.companyId, id, m);
    });
  }

  /** Deletes a location that has never been used; one with history is taken out of use instead. */
  async remove(user: AuthUser, id: string): Promise<void> {
    await this.db.transaction(async (m) => {
      const rows: { id: string }[] = await m.query(`SELECT id FROM locations WHERE company_id = $1 AND id = $2 FOR UPDATE`, [user.companyId, id]);
      if (rows.length === 0) {
        throw new NotFoundException('Location not found');
      }
      const [used] = (await m.query(
        `SELECT EXISTS (SELECT 1 FROM stock_movements WHERE location_id = $1 OR from_location_id = $1 OR to_location_id = $1)
             OR EXISTS (SELECT 1 FROM lots WHERE location_id = $1)
             OR EXISTS (SELECT 1 FROM temperature_readings WHERE location_id = $1)
             OR EXISTS (SELECT 1 FROM stock_count_locations WHERE location_id = $1)
             OR EXISTS (SELECT 1 FROM receipt_lines WHERE location_id = $1) AS history,
                EXISTS (SELECT 1 FROM locations WHERE parent_id = $1) AS children`,
        [id],
      )) as [{ history: boolean; children: boolean }];
      if (used.children) {
        throw new ConflictException({ message: 'Other locations are inside this one: move or delete them first', code: 'location_has_children' });
      }
      if (used.history) {
        throw new ConflictException({ message: 'This location has stock history, so it is kept: set it inactive instead', code: 'location_in_use' });
      }
      await m.query(`DELETE FROM locations WHERE id = $1`, [id]);
    });
  }

  private capacityFor(kind: LocationKind, capacity: string | undefined): string | null {
    if (kind === 'flammables-cabinet') {
      return capacity ?? String(FLAMMABLES_WORKROOM_LIMIT_L);
    }
    if (capacity !== undefined) {
      throw new BadRequestException({ message: 'capacityLitres: only a flammables cabinet has a capacity in litres', code: 'validation_failed' });
    }
    return null;
  }

  private async requireParent(m: EntityManager, companyId: string, parentId: string): Promise<void> {
    const found: unknown[] = await m.query(`SELECT 1 FROM locations WHERE company_id = $1 AND id = $2`, [companyId, parentId]);
    if (found.length === 0) {
      throw new NotFoundException('Parent location not found');
    }
  }

  private async refuseCycle(m: EntityManager, companyId: string, id: string, parentId: string): Promise<void> {
    const nodes = await this.ledger.allLocations(m, companyId);
    let cur: string | null = parentId;
    const seen = new Set<string>();
    while (cur && !seen.has(cur)) {
      if (cur === id) {
        throw new BadRequestException({ message: 'parentId: a location cannot be inside itself or inside a location it contains', code: 'validation_failed' });
      }
      seen.add(cur);
      cur = nodes.get(cur)?.parentId ?? null;
    }
  }

  private async saveUnique<T>(save: () => Promise<T>, name: string): Promise<T> {
    try {
      return await save();
    } catch (err) {
      if (err instanceof QueryFailedError && (err as { code?: string }).code === '23505') {
        throw new ConflictException({ message: `There is already a location called "${name}"`, code: 'duplicate_name' });
      }
      throw err;
    }
  }
}

/** Class 3 litres among `present` (see placement.litresOf). */
export function cabinetLitres(present: readonly Present[]): Decimal {
  let total = new Decimal(0);
  for (const p of present) {
    if (countsAgainstCabinet(p.material)) {
      total = total.plus(litresOf(p.quantity, p.material).litres ?? 0);
    }
  }
  return total;
}
