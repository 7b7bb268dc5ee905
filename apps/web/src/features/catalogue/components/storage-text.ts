import type { Material } from '../api/types';

/** "5 to 25 °C", "at most 25 °C", "—". */
export function storageText(material: Pick<Material, 'storageMinC' | 'storageMaxC'>): string {
  const { storageMinC: min, storageMaxC: max } = material;
  if (min !== null && max !== null) {
    return `${min} to ${max} °C`;
  }
  if (max !== null) {
    return `at most ${max} °C`;
  }
  if (min !== null) {
    return `at least ${min} °C`;
  }
  return '—';
}

/** "25 kg drum, 10 kg drum". */
export function packsText(material: Pick<Material, 'packSizes'>): string {
  return material.packSizes.map((pack) => pack.label).join(', ');
}
