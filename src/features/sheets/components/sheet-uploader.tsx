import { useRef, useState, type FormEvent } from 'react';
import { sheetKindLabels, sheetKinds, type SheetKind } from '../../../../shared/schemas/sheets';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import type { FormProgress } from '../../../lib/post-form';
import { useUploadSheet } from '../api/upload-sheet';
import { UploadProgressBar } from './upload-progress-bar';
import { LabelledOptions } from '../../../components/labelled-options';

/** Adds a service sheet (a PDF, drawn page by page on the server, or one JPEG, PNG or TIFF scan) with its kind, title and sharing. */
export function SheetUploader({ restorationId }: { restorationId: number }) {
  const upload = useUploadSheet(restorationId);
  const fileInput = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<SheetKind>('circuit-diagram');
  const [title, setTitle] = useState('');
  const [ownerVisible, setOwnerVisible] = useState(false);
  const [done, setDone] = useState('');
  const [progress, setProgress] = useState<(FormProgress & { pdf: boolean }) | null>(null);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const file = fileInput.current?.files?.[0];
    if (!file) return;
    setDone('');
    const pdf = file.type === 'application/pdf' || /\.pdf$/i.test(file.name);
    setProgress({ loaded: 0, total: file.size, pdf });
    upload.mutate(
      { file, fields: { kind, title, ownerVisible }, onProgress: (p) => setProgress({ ...p, pdf }) },
      {
        onSettled: () => setProgress(null),
        onSuccess: (sheet) => {
          setDone(`Added ${sheet.pages.length === 1 ? 'one page' : `${sheet.pages.length} pages`}.`);
          setTitle('');
          if (fileInput.current) fileInput.current.value = '';
        },
      },
    );
  };

  return (
    <form
      onSubmit={submit}
      className="space-y-3 rounded-xl border border-rule bg-panel p-4"
      aria-labelledby="sheet-upload-heading"
    >
      <h2 id="sheet-upload-heading" className="text-lg font-semibold">
        Add a service sheet
      </h2>
      <p className="text-sm text-ink-soft">
        A PDF (every page is kept, with the original to download) or a scan as JPEG, PNG or TIFF; 300 dpi keeps 6-point
        print legible.
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="block space-y-1">
          <span className="font-semibold">Kind</span>
          <select value={kind} onChange={(e) => setKind(e.target.value as SheetKind)} className={inputClass}>
            <LabelledOptions values={sheetKinds} labels={sheetKindLabels} />
          </select>
        </label>
        <label className="block space-y-1">
          <span className="font-semibold">Title (optional)</span>
          <input
            value={title}
            onChange={(e) => setTitle(e.target.value)}
            maxLength={200}
            className={inputClass}
            placeholder="e.g. Sheet 2, output stage"
          />
        </label>
      </div>
      <label className="block space-y-1">
        <span className="font-semibold">PDF or scan</span>
        <input
          ref={fileInput}
          type="file"
          name="file"
          required
          accept="application/pdf,.pdf,image/jpeg,image/png,image/tiff"
          className="block w-full"
        />
      </label>
      <label className="flex min-h-11 items-center gap-3">
        <input
          type="checkbox"
          checked={ownerVisible}
          onChange={(e) => setOwnerVisible(e.target.checked)}
          className="h-5 w-5 accent-glow"
        />
        <span>
          Share with owner{' '}
          <span className="text-sm text-ink-soft">— service sheets stay in the workshop unless shared</span>
        </span>
      </label>
      {progress && <UploadProgressBar {...progress} />}
      <div className="flex items-center gap-3">
        <Button type="submit" disabled={upload.isPending}>
          {upload.isPending ? 'Uploading…' : 'Add to the sheet'}
        </Button>
        <p role="status" className="text-sm">
          {upload.isError ? <span className="text-danger">{upload.error.message}</span> : done}
        </p>
      </div>
    </form>
  );
}
