import { useState, type FormEvent } from 'react';
import { sheetKindLabels, sheetKinds, type SheetKind, type SheetPage } from '../../../../shared/schemas/sheets';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useUpdateSheetPage } from '../api/update-sheet-page';
import { LabelledOptions } from '../../../components/labelled-options';

/** A page's kind, title and sharing, editable by a technician; the original file to download. */
export function SheetPageDetails({ page, canEdit }: { page: SheetPage; canEdit: boolean }) {
  const update = useUpdateSheetPage(page.restorationId, page.id);
  const [kind, setKind] = useState<SheetKind>(page.kind);
  const [title, setTitle] = useState(page.title);
  const [ownerVisible, setOwnerVisible] = useState(page.ownerVisible);
  const [saved, setSaved] = useState('');
  const original = page.urls.original && (
    <a href={page.urls.original} className="font-semibold text-glow-strong underline">
      Download the original file
    </a>
  );
  if (!canEdit) return original ? <p>{original}</p> : null;
  const submit = (e: FormEvent) => {
    e.preventDefault();
    setSaved('');
    update.mutate({ kind, title, ownerVisible }, { onSuccess: () => setSaved('Saved.') });
  };
  return (
    <div className="space-y-2">
      {original && <p>{original}</p>}
      <details className="rounded-xl border border-rule bg-panel p-3">
        <summary className="min-h-11 cursor-pointer content-center font-semibold">Kind, title and sharing</summary>
        <form onSubmit={submit} className="mt-2 grid items-end gap-3 sm:grid-cols-[12rem_1fr_auto_auto]">
          <label className="block space-y-1">
            <span className="text-sm font-semibold">Kind of page</span>
            <select value={kind} onChange={(e) => setKind(e.target.value as SheetKind)} className={inputClass}>
              <LabelledOptions values={sheetKinds} labels={sheetKindLabels} />
            </select>
          </label>
          <label className="block space-y-1">
            <span className="text-sm font-semibold">Page title</span>
            <input value={title} onChange={(e) => setTitle(e.target.value)} maxLength={200} className={inputClass} />
          </label>
          <label className="flex min-h-11 items-center gap-2">
            <input
              type="checkbox"
              checked={ownerVisible}
              onChange={(e) => setOwnerVisible(e.target.checked)}
              className="h-5 w-5 accent-glow"
            />
            <span>Share with owner</span>
          </label>
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? 'Saving…' : 'Save'}
          </Button>
        </form>
        <p role="status" className="mt-2 text-sm">
          {update.isError ? <span className="text-danger">{update.error.message}</span> : saved}
        </p>
      </details>
    </div>
  );
}
