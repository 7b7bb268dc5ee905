import { useMutation } from '@tanstack/react-query';
import { apiGetBlob, saveBlob } from '../../../lib/api-client';
import { materialSearch, type MaterialListParams } from './types';

/** Downloads the catalogue as CSV, filtered as the table is; the same columns an import reads. */
export async function exportMaterials(
  params: Pick<MaterialListParams, 'q' | 'kind' | 'active'>,
): Promise<void> {
  const blob = await apiGetBlob(`/materials/export.csv${materialSearch(params)}`);
  saveBlob(blob, `catalogue-${new Date().toISOString().slice(0, 10)}.csv`);
}

export function useExportMaterials() {
  return useMutation({
    mutationFn: exportMaterials,
    meta: { errorTitle: 'The catalogue was not exported' },
  });
}
