import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  MAX_ATTACHMENT_BYTES,
  type AttachmentView,
} from '../../../shared/attachments/attachment.schema';
import type { FirstServiceInput } from '../../../shared/service/service-record.schema';
import type {
  EngineRunRow,
  EngineServiceView,
  ServiceRecordView,
} from '../../../shared/service/service-views';
import { api, errorMessage } from '../../lib/api-client';

export const serviceKeys = {
  all: ['service'] as const,
  engine: (engineId: string) => [...serviceKeys.all, 'engine', engineId] as const,
  due: (engineId: string) => [...serviceKeys.engine(engineId), 'due'] as const,
  runs: (engineId: string) => [...serviceKeys.engine(engineId), 'runs'] as const,
  recordFirst: () => [...serviceKeys.all, 'record-first'] as const,
};

export const serviceQueries = {
  due: (engineId: string) =>
    queryOptions({
      queryKey: serviceKeys.due(engineId),
      queryFn: ({ signal }) =>
        api.get<EngineServiceView>(`/api/engines/${engineId}/service-due`, signal),
    }),
  runs: (engineId: string) =>
    queryOptions({
      queryKey: serviceKeys.runs(engineId),
      queryFn: ({ signal }) =>
        api.get<{ runs: EngineRunRow[] }>(`/api/engines/${engineId}/record`, signal),
      select: (data) => data.runs,
    }),
};

/** The engine's first service due, with how it was worked out. */
export const useServiceDue = (engineId: string) => useQuery(serviceQueries.due(engineId));
/** Every break-in run of the engine, newest first (staff). */
export const useEngineRuns = (engineId: string) => useQuery(serviceQueries.runs(engineId));

/** Addresses the browser opens itself (downloads), not fetched by the app. */
export const firstServiceCalendarUrl = (engineId: string) =>
  `/api/engines/${engineId}/first-service.ics`;
export const certificateUrl = (runId: string) => `/api/runs/${runId}/certificate`;

export interface RecordedFirstService {
  service: ServiceRecordView;
  /** Why the chosen file was not attached, when it was not; the service is saved either way. */
  attachmentProblem: string | null;
}

/** The file goes on the saved service record, through the attachments route. */
async function attachToService(serviceId: string, file: File): Promise<string | null> {
  if (file.size > MAX_ATTACHMENT_BYTES)
    return `${file.name} is larger than ${MAX_ATTACHMENT_BYTES / (1024 * 1024)} MB. Attach a smaller file below.`;
  const form = new FormData();
  form.append('id', crypto.randomUUID());
  form.append('recordType', 'service');
  form.append('recordId', serviceId);
  form.append('file', file, file.name);
  try {
    await api.postForm<{ attachment: AttachmentView }>('/api/attachments', form);
    return null;
  } catch (error) {
    return `${errorMessage(error)} Attach the file again below.`;
  }
}

/**
 * Saves the first service, then the optional file on it. The service is one record saved whole;
 * a file that fails to go says so and can be attached again on the saved record.
 */
export function useRecordFirstService(engineId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: serviceKeys.recordFirst(),
    mutationFn: async ({
      input,
      file,
    }: {
      input: FirstServiceInput;
      file: File | null;
    }): Promise<RecordedFirstService> => {
      const { service } = await api.post<{ service: ServiceRecordView }>(
        `/api/engines/${engineId}/services`,
        input,
      );
      return { service, attachmentProblem: file ? await attachToService(service.id, file) : null };
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: serviceKeys.engine(engineId) }),
  });
}
