import { EntityManager } from 'typeorm';
import type { Estimate } from './entities/estimate.entity';
import type { EstimateLine } from './entities/estimate-line.entity';
import type { EstimateMaterial } from './entities/estimate-material.entity';
import type { EstimatePack } from './entities/estimate-pack.entity';

/** An estimate with its lines, materials (with packs) and names, as respond() maps it. */
export interface EstimateBundle {
  estimate: Estimate;
  lines: EstimateLine[];
  materials: (EstimateMaterial & { packs: EstimatePack[] })[];
  names: Map<string, string>;
  accepted: boolean;
}

/**
 * One estimate version in one round trip: the row, and its lines, materials with packs and the
 * names they show, as JSON built by PostgreSQL. Every numeric is cast to text on the way, so no
 * quantity or amount passes through a binary float. null when the job has no such version.
 */
const READ_SQL = `
  SELECT json_build_object(
    'id', e.id, 'companyId', e.company_id, 'jobId', e.job_id, 'version', e.version, 'buildUpId', e.build_up_id,
    'buildUpName', e.build_up_name, 'buildUp', e.build_up, 'roof', e.roof, 'pricedOn', e.priced_on::text, 'costBasis', e.cost_basis,
    'airC', e.air_c::text, 'catalystPct', e.catalyst_pct::text, 'deckAreaM2', e.deck_area_m2::text,
    'upstandAreaM2', e.upstand_area_m2::text, 'laminatedAreaM2', e.laminated_area_m2::text, 'trimM', e.trim_m::text,
    'cornersExternal', e.corners_external, 'cornersInternal', e.corners_internal, 'cornersDerived', e.corners_derived,
    'pipes', e.pipes, 'outlets', e.outlets, 'laminatingHours', e.laminating_hours::text, 'trimHours', e.trim_hours::text,
    'labourHours', e.labour_hours::text, 'labourRate', e.labour_rate::text, 'materialCost', e.material_cost::text,
    'labourCost', e.labour_cost::text, 'markupPct', e.markup_pct::text, 'markup', e.markup::text, 'net', e.net::text,
    'vatRatePct', e.vat_rate_pct::text, 'vat', e.vat::text, 'gross', e.gross::text, 'unpriced', e.unpriced,
    'cautions', e.cautions, 'note', e.note, 'createdBy', e.created_by, 'createdAt', e.created_at,
    'acceptedAt', e.accepted_at, 'acceptedBy', e.accepted_by
  ) AS estimate,
  (j.accepted_estimate_id = e.id) AS accepted,
  (SELECT coalesce(json_agg(json_build_object(
      'id', l.id, 'position', l.position, 'role', l.role, 'materialKind', l.material_kind, 'description', l.description,
      'unit', l.unit, 'quantity', l.quantity::text, 'lengths', l.lengths, 'metres', l.metres::text, 'materialId', l.material_id
    ) ORDER BY l.position), '[]'::json) FROM estimate_lines l WHERE l.estimate_id = e.id) AS lines,
  (SELECT coalesce(json_agg(json_build_object(
      'id', x.id, 'position', x.position, 'roles', x.roles, 'materialKind', x.material_kind, 'materialId', x.material_id,
      'materialName', x.material_name, 'stockUnit', x.stock_unit, 'quantity', x.quantity::text, 'stockQuantity', x.stock_quantity::text, 'packTotal', x.pack_total::text,
      'leftover', x.leftover::text, 'cost', x.cost::text, 'problem', x.problem,
      'packs', (SELECT coalesce(json_agg(json_build_object(
          'id', p.id, 'estimateMaterialId', p.estimate_material_id, 'packSize', p.pack_size::text, 'label', p.label, 'count', p.count,
          'packPrice', p.pack_price::text, 'supplierId', p.supplier_id, 'supplierName', p.supplier_name,
          'leadTimeDays', p.lead_time_days, 'cost', p.cost::text, 'source', p.source, 'lotId', p.lot_id,
          'batchNumber', p.batch_number, 'unitCost', p.unit_cost::text
        ) ORDER BY p.source, p.pack_size DESC), '[]'::json) FROM estimate_packs p WHERE p.estimate_material_id = x.id)
    ) ORDER BY x.position), '[]'::json) FROM estimate_materials x WHERE x.estimate_id = e.id) AS materials,
  (SELECT coalesce(json_object_agg(n.id, n.name), '{}'::json) FROM (
      SELECT mt.id, mt.name FROM materials mt WHERE mt.id IN (SELECT material_id FROM estimate_lines WHERE estimate_id = e.id)
      UNION ALL SELECT u.id, u.name FROM users u WHERE u.id = e.created_by) n) AS names
  FROM estimates e JOIN jobs j ON j.id = e.job_id
  WHERE e.company_id = $1 AND e.job_id = $2 AND e.version = $3`;

type Row = {
  estimate: Omit<Estimate, 'createdAt' | 'acceptedAt'> & { createdAt: string; acceptedAt: string | null };
  accepted: boolean;
  lines: EstimateLine[];
  materials: (EstimateMaterial & { packs: EstimatePack[] })[];
  names: Record<string, string>;
};

export async function readEstimateVersion(
  m: EntityManager,
  companyId: string,
  jobId: string,
  version: number,
): Promise<EstimateBundle | null> {
  const rows: Row[] = await m.query(READ_SQL, [companyId, jobId, version]);
  const r = rows[0];
  if (!r) {
    return null;
  }
  const estimate = {
    ...r.estimate,
    createdAt: new Date(r.estimate.createdAt),
    acceptedAt: r.estimate.acceptedAt ? new Date(r.estimate.acceptedAt) : null,
  } as Estimate;
  return {
    estimate,
    accepted: r.accepted,
    lines: r.lines,
    materials: r.materials,
    names: new Map(Object.entries(r.names)),
  };
}
