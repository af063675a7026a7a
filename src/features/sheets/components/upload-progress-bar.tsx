/**
 * How far a service sheet upload has gone: the bytes sent, then (once all are sent) an open-ended bar while
 * the server draws a PDF's pages or prepares the scan.
 */
export function UploadProgressBar({ loaded, total, pdf }: { loaded: number; total: number; pdf: boolean }) {
  const sent = total > 0 && loaded >= total;
  const label = sent
    ? pdf
      ? 'Drawing the PDF’s pages…'
      : 'Preparing the page…'
    : `Uploading… ${total ? Math.round((loaded / total) * 100) : 0} %`;
  return (
    <div className="space-y-1">
      <progress
        aria-label={label}
        {...(sent ? {} : { value: loaded, max: total || 1 })}
        className="h-2 w-full overflow-hidden rounded-full bg-sunken accent-glow [&::-moz-progress-bar]:bg-glow [&::-webkit-progress-bar]:bg-sunken [&::-webkit-progress-value]:bg-glow"
      />
      <p className="text-sm text-ink-soft">{label}</p>
    </div>
  );
}
