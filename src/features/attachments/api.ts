import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  MAX_ATTACHMENT_BYTES,
  type AttachmentRecordType,
  type AttachmentView,
} from '../../../shared/attachments/attachment.schema';
import { api } from '../../lib/api-client';

export const attachmentKeys = {
  all: ['attachments'] as const,
  list: (recordType: AttachmentRecordType, recordId: string) =>
    [...attachmentKeys.all, 'list', recordType, recordId] as const,
  upload: () => [...attachmentKeys.all, 'upload'] as const,
  remove: () => [...attachmentKeys.all, 'remove'] as const,
};

export const attachmentQueries = {
  list: (recordType: AttachmentRecordType, recordId: string) =>
    queryOptions({
      queryKey: attachmentKeys.list(recordType, recordId),
      queryFn: ({ signal }) =>
        api.get<{ attachments: AttachmentView[] }>(
          `/api/attachments?recordType=${recordType}&recordId=${encodeURIComponent(recordId)}`,
          signal,
        ),
      select: (data) => data.attachments,
    }),
};

export const useAttachments = (recordType: AttachmentRecordType, recordId: string) =>
  useQuery(attachmentQueries.list(recordType, recordId));

/** Refused before sending: the server would refuse it too, after the wait of a large upload. */
export class TooLargeError extends Error {}

export function useUploadAttachment(recordType: AttachmentRecordType, recordId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: attachmentKeys.upload(),
    mutationFn: async ({ file, caption }: { file: File; caption: string }) => {
      if (file.size > MAX_ATTACHMENT_BYTES) {
        throw new TooLargeError(
          `${file.name} is larger than ${MAX_ATTACHMENT_BYTES / (1024 * 1024)} MB. Send a smaller photo or a shorter document.`,
        );
      }
      const form = new FormData();
      // A client-made id makes a retried upload store the file once.
      form.append('id', crypto.randomUUID());
      form.append('recordType', recordType);
      form.append('recordId', recordId);
      if (caption.trim()) form.append('caption', caption.trim());
      form.append('file', file, file.name);
      return api.postForm<{ attachment: AttachmentView }>('/api/attachments', form);
    },
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: attachmentKeys.list(recordType, recordId) }),
  });
}

export function useRemoveAttachment(recordType: AttachmentRecordType, recordId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationKey: attachmentKeys.remove(),
    mutationFn: (id: string) => api.delete<void>(`/api/attachments/${id}`),
    onSuccess: () =>
      queryClient.invalidateQueries({ queryKey: attachmentKeys.list(recordType, recordId) }),
  });
}
