import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sheetPageSchema, type SheetPagePatch } from '../../../../shared/schemas/sheets';
import { api } from '../../../lib/api-client';
import { sheetPagesQueryKey } from './get-sheet-pages';

/** PATCH a page's kind, title or sharing. */
export function useUpdateSheetPage(restorationId: number, pageId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (patch: SheetPagePatch) =>
      api(`/sheet-pages/${pageId}`, { method: 'PATCH', json: patch, schema: sheetPageSchema }),
    onSettled: () => client.invalidateQueries({ queryKey: sheetPagesQueryKey(restorationId) }),
  });
}
