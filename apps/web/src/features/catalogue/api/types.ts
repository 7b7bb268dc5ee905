import type { EdgeKind, HazardClass, MaterialKind } from '@potlife/domain';
import type { StockUnit } from '../../../lib/material-words';

// The catalogue as the API sends it (apps/api/src/catalogue/dto/material.dto.ts).

export interface PackSize {
  size: string;
  label: string;
}

export type PackingGroup = 'I' | 'II' | 'III';

/** What a trim is: a straight length or a corner piece (trims only). */
export type TrimPiece = 'length' | 'external-corner' | 'internal-corner';
export const TRIM_PIECES: readonly TrimPiece[] = ['length', 'external-corner', 'internal-corner'];

/** A trim piece in plain words, for the form, the list and the material page. */
export const trimPieceLabels: Record<TrimPiece, string> = {
  length: 'Straight length',
  'external-corner': 'External corner piece',
  'internal-corner': 'Internal corner piece',
};

export interface Material {
  id: string;
  code: string;
  name: string;
  kind: MaterialKind;
  stockUnit: StockUnit;
  packSizes: PackSize[];
  lotTracked: boolean;
  shelfLifeDays: number | null;
  storageMinC: string | null;
  storageMaxC: string | null;
  hazardClass: HazardClass;
  unNumber: string | null;
  packingGroup: PackingGroup | null;
  flashPointC: string | null;
  isAccelerator: boolean;
  reorderLevel: string;
  reorderQuantity: string;
  matGsm: number | null;
  rollWidthM: string | null;
  trimKind: EdgeKind | null;
  trimLengthM: string | null;
  /** trims only; the estimate takes corner pieces by it */
  trimPiece: TrimPiece | null;
  topcoatColour: string | null;
  litresPerKg: string | null;
  active: boolean;
  notes: string | null;
  createdAt: string;
  updatedAt: string;
}

export type MaterialBody = Omit<Material, 'id' | 'createdAt' | 'updatedAt'>;

export interface MaterialPage {
  items: Material[];
  total: number;
  page: number;
  pageSize: number;
}

export const MATERIAL_SORTS = [
  'code',
  'name',
  'kind',
  'stockUnit',
  'shelfLifeDays',
  'hazardClass',
  'createdAt',
  'updatedAt',
] as const;
export type MaterialSort = (typeof MATERIAL_SORTS)[number];

export interface MaterialListParams {
  q?: string;
  /** One kind or several. */
  kind?: MaterialKind[];
  active?: 'true' | 'false' | 'all';
  sort?: MaterialSort;
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

/** `?q=&kind=a,b&active=` for the list and the export. */
export function materialSearch(params: MaterialListParams): string {
  const search = new URLSearchParams();
  if (params.q?.trim()) {
    search.set('q', params.q.trim());
  }
  if (params.kind && params.kind.length > 0) {
    search.set('kind', params.kind.join(','));
  }
  if (params.active) {
    search.set('active', params.active);
  }
  if (params.sort) {
    search.set('sort', params.sort);
  }
  if (params.order) {
    search.set('order', params.order);
  }
  if (params.page) {
    search.set('page', String(params.page));
  }
  if (params.pageSize) {
    search.set('pageSize', String(params.pageSize));
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}

export const catalogueKeys = {
  all: ['catalogue'] as const,
  lists: () => [...catalogueKeys.all, 'list'] as const,
  list: (params: MaterialListParams) => [...catalogueKeys.lists(), params] as const,
  detail: (id: string) => [...catalogueKeys.all, 'detail', id] as const,
  prices: (id: string) => [...catalogueKeys.all, 'prices', id] as const,
};
