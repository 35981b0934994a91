import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { Linking, Platform } from 'react-native';
import type { AttachmentOwnerKind, AttachmentPurpose, AttachmentRecord, SignedLink } from '@/shared/contract/attachments';
import type { Page } from '@/shared/contract/records';
import { api } from '../api/client';
import { openFile, saveFile } from '../api/download';
import { appendFile, upload, type PickedFile } from '../api/upload';

export type { AttachmentOwnerKind, AttachmentPurpose, AttachmentRecord };

export const attachmentKeys = {
  all: ['attachments'] as const,
  owner: (ownerKind: AttachmentOwnerKind, ownerId: string) => ['attachments', ownerKind, ownerId] as const,
};

export function useAttachmentsQuery(ownerKind: AttachmentOwnerKind, ownerId: string) {
  return useQuery({
    queryKey: attachmentKeys.owner(ownerKind, ownerId),
    queryFn: () => api<Page<AttachmentRecord>>(`/attachments?ownerKind=${ownerKind}&ownerId=${encodeURIComponent(ownerId)}`),
    enabled: !!ownerId,
  });
}

/** Uploads a file to a record; `onSaved` runs after its list is refreshed (a certificate also changes its lot). */
export function useAttachmentUploadMutation(ownerKind: AttachmentOwnerKind, ownerId: string, purpose: AttachmentPurpose = 'file', onSaved?: () => Promise<unknown> | void) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ file, onProgress }: { file: PickedFile; onProgress?: (fraction: number) => void }) => {
      const form = new FormData();
      form.append('ownerKind', ownerKind);
      form.append('ownerId', ownerId);
      if (purpose !== 'file') form.append('purpose', purpose);
      appendFile(form, 'file', file);
      return upload<AttachmentRecord>('/attachments', form, { onProgress });
    },
    onSuccess: () => Promise.all([qc.invalidateQueries({ queryKey: attachmentKeys.owner(ownerKind, ownerId) }), onSaved?.()]),
  });
}

/** In the native app the file opens through a two-minute signed link; in a browser, as a blob behind the token. */
async function openSigned(id: string): Promise<void> {
  const { url } = await api<SignedLink>(`/attachments/${id}/url`);
  await Linking.openURL(url);
}

export const openAttachment = (id: string, fileName: string) => (Platform.OS === 'web' ? openFile(`/attachments/${id}/content`, fileName) : openSigned(id));
export const downloadAttachment = (id: string, fileName: string) => (Platform.OS === 'web' ? saveFile(`/attachments/${id}/content`, fileName) : openSigned(id));
