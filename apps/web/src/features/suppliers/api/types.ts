import type { MaterialKind } from '@potlife/domain';

// Suppliers, contacts and prices as the API sends them (apps/api/src/suppliers/dto).

export interface Contact {
  id: string;
  name: string;
  email: string | null;
  phone: string | null;
  role: string | null;
  createdAt: string;
}

export interface Supplier {
  id: string;
  name: string;
  orderEmail: string | null;
  phone: string | null;
  address: string | null;
  leadTimeDays: number;
  active: boolean;
  notes: string | null;
  contacts: Contact[];
  createdAt: string;
  updatedAt: string;
}

export interface SupplierPage {
  items: Supplier[];
  total: number;
  page: number;
  pageSize: number;
}

export interface PriceRef {
  id: string;
  packPrice: string;
  validFrom: string;
}

export interface SupplierPrice {
  id: string;
  supplierId: string;
  supplierName: string;
  supplierActive: boolean;
  materialId: string;
  materialCode: string;
  materialName: string;
  materialKind: MaterialKind;
  materialActive: boolean;
  stockUnit: string;
  packSize: string;
  packLabel: string | null;
  packPrice: string;
  unitPrice: string;
  validFrom: string;
  supplierCode: string | null;
  previous: PriceRef | null;
  next: PriceRef | null;
  createdAt: string;
}

export interface SupplierPricePage {
  items: SupplierPrice[];
  total: number;
  page: number;
  pageSize: number;
  on: string;
}

export const SUPPLIER_SORTS = ['name', 'leadTimeDays', 'createdAt', 'updatedAt'] as const;
export type SupplierSort = (typeof SUPPLIER_SORTS)[number];
export const PRICE_SORTS = [
  'materialCode',
  'materialName',
  'packSize',
  'packPrice',
  'unitPrice',
  'validFrom',
] as const;
export type PriceSort = (typeof PRICE_SORTS)[number];

export interface SupplierListParams {
  q?: string;
  active?: 'true' | 'false' | 'all';
  sort?: SupplierSort;
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

export interface PriceListParams {
  q?: string;
  kind?: MaterialKind[];
  on?: string;
  sort?: PriceSort;
  order?: 'asc' | 'desc';
  page?: number;
  pageSize?: number;
}

export function searchOf(params: object): string {
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value === undefined || value === null || value === '') {
      continue;
    }
    if (Array.isArray(value)) {
      if (value.length > 0) {
        search.set(key, value.join(','));
      }
    } else {
      search.set(key, String(value).trim());
    }
  }
  const text = search.toString();
  return text ? `?${text}` : '';
}

export const suppliersKeys = {
  all: ['suppliers'] as const,
  lists: () => [...suppliersKeys.all, 'list'] as const,
  list: (params: SupplierListParams) => [...suppliersKeys.lists(), params] as const,
  detail: (id: string) => [...suppliersKeys.all, 'detail', id] as const,
  prices: (id: string) => [...suppliersKeys.all, 'prices', id] as const,
  priceList: (id: string, params: PriceListParams) => [...suppliersKeys.prices(id), params] as const,
  materialHistory: (supplierId: string, materialId: string) =>
    [...suppliersKeys.prices(supplierId), 'history', materialId] as const,
  materials: () => [...suppliersKeys.all, 'materials'] as const,
};
