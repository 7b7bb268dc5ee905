import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { ImportMode, ImportRowBase, ImportSummary } from '../../../components/csv-import/CsvImportFlow';
import { apiGetBlob, saveBlob } from '../../../lib/api-client';
import { apiSendWithProgress, type SendProgress } from '../../../lib/upload';
import { suppliersKeys } from './types';

export interface PriceImportRow extends ImportRowBase {
  code: string;
  name: string;
  packSize: string | null;
  packPrice: string | null;
  validFrom: string | null;
  previousPrice: string | null;
}

export type PriceImportResult = ImportSummary<PriceImportRow>;

/** `POST /api/suppliers/{id}/prices/import?mode=` with the file's text and a date for rows without one. */
export function importPrices(
  supplierId: string,
  mode: ImportMode,
  csv: string,
  validFrom: string | null,
  onProgress?: (progress: SendProgress) => void,
): Promise<PriceImportResult> {
  return apiSendWithProgress<PriceImportResult>(
    `/suppliers/${encodeURIComponent(supplierId)}/prices/import?mode=${mode}`,
    {
      body: validFrom ? { csv, validFrom } : { csv },
      onProgress,
    },
  );
}

export function useImportPrices(supplierId: string, validFrom: string | null) {
  const queryClient = useQueryClient();
  return useCallback(
    async (mode: ImportMode, csv: string, onProgress: (progress: SendProgress) => void) => {
      const result = await importPrices(supplierId, mode, csv, validFrom, onProgress);
      if (mode === 'commit') {
        await queryClient.invalidateQueries({ queryKey: suppliersKeys.prices(supplierId) });
      }
      return result;
    },
    [queryClient, supplierId, validFrom],
  );
}

/** Downloads the prices in force today as a price list CSV (the columns an import reads). */
export async function exportPrices(supplierId: string, supplierName: string): Promise<void> {
  const blob = await apiGetBlob(`/suppliers/${encodeURIComponent(supplierId)}/prices/export.csv`);
  const slug =
    supplierName
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'supplier';
  saveBlob(blob, `prices-${slug}-${new Date().toISOString().slice(0, 10)}.csv`);
}

export function useExportPrices() {
  return useMutation({
    mutationFn: ({ supplierId, supplierName }: { supplierId: string; supplierName: string }) =>
      exportPrices(supplierId, supplierName),
    meta: { errorTitle: 'The price list was not exported' },
  });
}
