import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import type { Sheet, sheetUploadFieldsSchema } from '../../../../shared/schemas/sheets';
import { api } from '../../../lib/api-client';
import { sheetPagesQueryKey } from './get-sheet-pages';

export type SheetUploadValues = z.output<typeof sheetUploadFieldsSchema>;

/** POST one scan as multipart/form-data (field `file`); answers the sheet with its pages. */
export function uploadSheet(restorationId: number, file: File, fields: SheetUploadValues): Promise<Sheet> {
  const form = new FormData();
  form.set('kind', fields.kind);
  form.set('title', fields.title);
  form.set('ownerVisible', String(fields.ownerVisible));
  form.set('file', file);
  return api<Sheet>(`/restorations/${restorationId}/sheets`, { method: 'POST', body: form });
}

export function useUploadSheet(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ file, fields }: { file: File; fields: SheetUploadValues }) => uploadSheet(restorationId, file, fields),
    onSettled: () => client.invalidateQueries({ queryKey: sheetPagesQueryKey(restorationId) }),
  });
}
