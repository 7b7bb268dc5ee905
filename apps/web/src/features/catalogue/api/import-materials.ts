import { useQueryClient } from '@tanstack/react-query';
import { useCallback } from 'react';
import type { ImportMode, ImportRowBase, ImportSummary } from '../../../components/csv-import/CsvImportFlow';
import { apiSendWithProgress, type SendProgress } from '../../../lib/upload';
import { catalogueKeys } from './types';

export interface MaterialImportRow extends ImportRowBase {
  code: string;
  name: string;
}

export type MaterialImportResult = ImportSummary<MaterialImportRow>;

/** `POST /api/materials/import?mode=preview|commit` with the file's text; commit writes every row or none. */
export function importMaterials(
  mode: ImportMode,
  csv: string,
  onProgress?: (progress: SendProgress) => void,
): Promise<MaterialImportResult> {
  return apiSendWithProgress<MaterialImportResult>(`/materials/import?mode=${mode}`, {
    body: { csv },
    onProgress,
  });
}

/** The import, refreshing the catalogue after a commit. */
export function useImportMaterials() {
  const queryClient = useQueryClient();
  return useCallback(
    async (mode: ImportMode, csv: string, onProgress: (progress: SendProgress) => void) => {
      const result = await importMaterials(mode, csv, onProgress);
      if (mode === 'commit') {
        await queryClient.invalidateQueries({ queryKey: catalogueKeys.all });
      }
      return result;
    },
    [queryClient],
  );
}
