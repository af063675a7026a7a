import { useEffect, useRef, useState, type ChangeEvent, type DragEvent } from 'react';
import { Button } from '../../../components/button';
import { acceptedTypes } from '../../../lib/photo-format';

const carriesFiles = (e: { dataTransfer: DataTransfer | null }) => Boolean(e.dataTransfer?.types.includes('Files'));

/**
 * Where photos come in: dropped files, the file picker, or the phone's camera. The buttons are the keyboard
 * and screen-reader path; dropping is a shortcut for a mouse.
 */
export function DropZone({ onFiles }: { onFiles: (files: File[]) => void }) {
  const [dragging, setDragging] = useState(false);
  const pickRef = useRef<HTMLInputElement>(null);
  const cameraRef = useRef<HTMLInputElement>(null);

  // A photo dropped beside the zone would otherwise make the browser open it and leave the page.
  useEffect(() => {
    const swallow = (e: globalThis.DragEvent) => carriesFiles(e) && e.preventDefault();
    window.addEventListener('dragover', swallow);
    window.addEventListener('drop', swallow);
    return () => {
      window.removeEventListener('dragover', swallow);
      window.removeEventListener('drop', swallow);
    };
  }, []);

  const over = (e: DragEvent) => {
    if (!carriesFiles(e)) return;
    e.preventDefault();
    e.dataTransfer.dropEffect = 'copy';
    setDragging(true);
  };
  const leave = (e: DragEvent<HTMLDivElement>) => {
    if (!(e.relatedTarget instanceof Node && e.currentTarget.contains(e.relatedTarget))) setDragging(false);
  };
  const drop = (e: DragEvent) => {
    e.preventDefault();
    setDragging(false);
    onFiles(Array.from(e.dataTransfer.files));
  };
  const picked = (e: ChangeEvent<HTMLInputElement>) => {
    onFiles(Array.from(e.target.files ?? []));
    e.target.value = ''; // so the same file can be picked again after a failure
  };

  return (
    <div
      onDragEnter={over}
      onDragOver={over}
      onDragLeave={leave}
      onDrop={drop}
      className={`flex flex-col items-center gap-3 rounded-xl border-2 border-dashed px-4 py-6 text-center transition-colors ${
        dragging ? 'border-glow bg-glow-soft' : 'border-rule bg-sunken/50'
      }`}
    >
      {/* Nothing is dragged on a touch screen: there the buttons say it all. */}
      <p className="font-semibold pointer-coarse:hidden">
        {dragging ? 'Let go to add these photos' : 'Drop photos here'}
      </p>
      <div className="flex flex-wrap justify-center gap-2">
        <Button onClick={() => pickRef.current?.click()}>Choose photos</Button>
        <Button variant="quiet" className="pointer-fine:hidden" onClick={() => cameraRef.current?.click()}>
          Take a photo
        </Button>
      </div>
      <p className="text-sm text-ink-soft">JPEG, PNG, WebP, HEIC or AVIF, up to 40 MB each.</p>
      <input
        ref={pickRef}
        type="file"
        multiple
        accept={acceptedTypes.join(',')}
        hidden
        onChange={picked}
        aria-label="Choose photos"
      />
      <input
        ref={cameraRef}
        type="file"
        accept="image/*"
        capture="environment"
        hidden
        onChange={picked}
        aria-label="Take a photo"
      />
    </div>
  );
}
