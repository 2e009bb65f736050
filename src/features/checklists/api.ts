import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import type {
  ChecklistInput,
  ReopenChecklistInput,
} from '../../../shared/checklists/checklist.schema';
import type { ChecklistView } from '../../../shared/checklists/checklist-view';
import { api } from '../../lib/api-client';

export const checklistKeys = {
  all: ['checklists'] as const,
  detail: (engineId: string) => [...checklistKeys.all, 'detail', engineId] as const,
  save: () => [...checklistKeys.all, 'save'] as const,
  complete: () => [...checklistKeys.all, 'complete'] as const,
  reopen: () => [...checklistKeys.all, 'reopen'] as const,
};

export const checklistQueries = {
  detail: (engineId: string) =>
    queryOptions({
      queryKey: checklistKeys.detail(engineId),
      queryFn: ({ signal }) =>
        api.get<{ checklist: ChecklistView }>(`/api/engines/${engineId}/checklist`, signal),
      select: (data) => data.checklist,
    }),
};

export const useChecklist = (engineId: string) => useQuery(checklistQueries.detail(engineId));

/**
 * Save keeps a part-done checklist; complete saves and closes it in one step. Both answer with the
 * checklist as stored, which replaces the cached one. `onChanged` lets the page refresh what shows
 * the checklist's state elsewhere (the engine lists).
 */
function useChecklistWrite(engineId: string, action: 'save' | 'complete', onChanged?: () => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: action === 'save' ? checklistKeys.save() : checklistKeys.complete(),
    mutationFn: (input: ChecklistInput) =>
      action === 'save'
        ? api.put<{ checklist: ChecklistView }>(`/api/engines/${engineId}/checklist`, input)
        : api.post<{ checklist: ChecklistView }>(
            `/api/engines/${engineId}/checklist/complete`,
            input,
          ),
    onSuccess: (data) => {
      queryClient.setQueryData(checklistKeys.detail(engineId), data);
      onChanged?.();
    },
    // A refused completion still saved the entries as the draft: show it as stored.
    onError: () => {
      if (action !== 'complete') return;
      void queryClient.invalidateQueries({ queryKey: checklistKeys.detail(engineId) });
      onChanged?.();
    },
  });
}

export const useSaveChecklist = (engineId: string, onChanged?: () => void) =>
  useChecklistWrite(engineId, 'save', onChanged);
export const useCompleteChecklist = (engineId: string, onChanged?: () => void) =>
  useChecklistWrite(engineId, 'complete', onChanged);

/** Opens a completed checklist again; the reason goes into the engine's trail. */
export function useReopenChecklist(engineId: string, onChanged?: () => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: checklistKeys.reopen(),
    mutationFn: (input: ReopenChecklistInput) =>
      api.post<{ checklist: ChecklistView }>(`/api/engines/${engineId}/checklist/reopen`, input),
    onSuccess: (data) => {
      queryClient.setQueryData(checklistKeys.detail(engineId), data);
      onChanged?.();
    },
  });
}
