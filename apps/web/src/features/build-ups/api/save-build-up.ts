import type { BuildUpRates } from '@potlife/domain';
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { apiPatch, apiPost } from '../../../lib/api-client';
import { buildUpsKeys, type BuildUp } from './get-build-ups';

export type BuildUpBody = Partial<BuildUpRates> & {
  name?: string;
  description?: string | null;
  labourRate?: string;
  markupPct?: string;
  vatRatePct?: string;
  active?: boolean;
};

export function createBuildUp(body: BuildUpBody): Promise<BuildUp> {
  return apiPost<BuildUp>('/build-ups', body);
}

export function updateBuildUp({ id, ...body }: BuildUpBody & { id: string }): Promise<BuildUp> {
  return apiPatch<BuildUp>(`/build-ups/${encodeURIComponent(id)}`, body);
}

/** Creates a build-up, or changes one when an id is given. */
export function useSaveBuildUp() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: BuildUpBody & { id?: string }) =>
      body.id ? updateBuildUp({ ...body, id: body.id }) : createBuildUp(body),
    meta: { errorTitle: 'The build-up was not saved' },
    // Jobs show a build-up's name; estimates are made with its rates.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: buildUpsKeys.all }),
        queryClient.invalidateQueries({ queryKey: ['jobs'] }),
      ]),
  });
}
