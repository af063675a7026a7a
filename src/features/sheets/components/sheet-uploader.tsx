import { useRef, useState, type FormEvent } from 'react';
import { sheetKindLabels, sheetKinds, type SheetKind } from '../../../../shared/schemas/sheets';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useUploadSheet } from '../api/upload-sheet';

/** Adds one scanned page (JPEG, PNG or TIFF) with its kind, title and sharing. */
export function SheetUploader({ restorationId }: { restorationId: number }) {
  const upload = useUploadSheet(restorationId);
  const fileInput = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<SheetKind>('circuit-diagram');
  const [title, setTitle] = useState('');
  const [ownerVisible, setOwnerVisible] = useState(false);
  const [done, setDone] = useState('');

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const file = fileInput.current?.files?.[0];
    if (!file) return;
    setDone('');
    upload.mutate(
      { file, fields: { kind, title, ownerVisible } },
      {
        onSuccess: (sheet) => {
          setDone(`Added ${sheet.pages.length === 1 ? 'one page' : `${sheet.pages.length} pages`}.`);
          setTitle('');
          if (fileInput.current) fileInput.current.value = '';
        },
      },
    );
  };

  return (
    <form onSubmit={submit} className="space-y-3 rounded-xl border border-rule bg-panel p-4" aria-labelledby="sheet-upload-heading">
      <h2 id="sheet-upload-heading" className="text-lg font-semibold">Add a service sheet page</h2>
      <p className="text-sm text-ink-soft">A scan as JPEG, PNG or TIFF; 300 dpi keeps 6-point print legible. PDFs: export each page as PNG or TIFF for now.</p>
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="block space-y-1">
          <span className="font-semibold">Kind</span>
          <select value={kind} onChange={(e) => setKind(e.target.value as SheetKind)} className={inputClass}>
            {sheetKinds.map((k) => (
              <option key={k} value={k}>
                {sheetKindLabels[k]}
              </option>
            ))}
          </select>
        </label>
        <label className="block space-y-1">
          <span className="font-semibold">Title (optional)</span>
          <input value={title} onChange={(e) => setTitle(e.target.value)} maxLength={200} className={inputClass} placeholder="e.g. Sheet 2, output stage" />
        </label>
      </div>
      <label className="block space-y-1">
        <span className="font-semibold">Scan</span>
        <input ref={fileInput} type="file" name="file" required accept="image/jpeg,image/png,image/tiff" className="block w-full" />
      </label>
      <label className="flex min-h-11 items-center gap-3">
        <input type="checkbox" checked={ownerVisible} onChange={(e) => setOwnerVisible(e.target.checked)} className="h-5 w-5 accent-glow" />
        <span>
          Share with owner <span className="text-sm text-ink-soft">— service sheets stay in the workshop unless shared</span>
        </span>
      </label>
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={upload.isPending}>
          {upload.isPending ? 'Uploading…' : 'Add page'}
        </Button>
        <p role="status" className="text-sm">
          {upload.isError ? <span className="text-danger">{upload.error.message}</span> : done}
        </p>
      </div>
    </form>
  );
}
