import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';
import { sheetSchema, type Sheet, type sheetUploadFieldsSchema } from '../../../../shared/schemas/sheets';
import { postForm, type FormProgress } from '../../../lib/post-form';
import { sheetPagesQueryKey } from './get-sheet-pages';
import { referencesQueryKey } from '../../../lib/queries/references';

export type SheetUploadValues = z.output<typeof sheetUploadFieldsSchema>;

const fallback: Record<number, string> = {
  413: 'That file is larger than Gridleak accepts.',
  415: 'That file is not a PDF or a JPEG, PNG or TIFF scan.',
};

/** POST a PDF or one scan as multipart/form-data (field `file`); answers the sheet with its pages. */
export function uploadSheet(
  restorationId: number,
  file: File,
  fields: SheetUploadValues,
  onProgress?: (p: FormProgress) => void,
): Promise<Sheet> {
  const form = new FormData();
  // Text fields before the file: a streaming parser then knows them when the file arrives.
  form.set('kind', fields.kind);
  form.set('title', fields.title);
  form.set('ownerVisible', String(fields.ownerVisible));
  form.set('file', file, file.name);
  return postForm(`/restorations/${restorationId}/sheets`, form, { schema: sheetSchema, onProgress, fallback });
}

export function useUploadSheet(restorationId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({
      file,
      fields,
      onProgress,
    }: {
      file: File;
      fields: SheetUploadValues;
      onProgress?: (p: FormProgress) => void;
    }) => uploadSheet(restorationId, file, fields, onProgress),
    onSettled: () =>
      Promise.all([
        client.invalidateQueries({ queryKey: sheetPagesQueryKey(restorationId) }),
        client.invalidateQueries({ queryKey: referencesQueryKey(restorationId) }),
      ]),
  });
}
