import { useState } from 'react';
import { Link } from 'react-router';
import { findingPath, kindLabels, type Finding } from '../../../../shared/schemas/findings';

function Closeup({ findingId }: { findingId: number }) {
  const [failed, setFailed] = useState(false);
  if (failed) return <span aria-hidden="true" className="block h-full w-full bg-sunken" />;
  return (
    <img
      src={`/api/findings/${findingId}/closeup`}
      alt=""
      loading="lazy"
      decoding="async"
      onError={() => setFailed(true)}
      className="h-full w-full object-cover"
    />
  );
}

/** What the workshop put right, each with a close-up of the marked spot; pass the repaired findings only. */
export function RepairedFindings({ findings }: { findings: Finding[] }) {
  if (findings.length === 0)
    return (
      <p className="text-ink-soft">Repairs appear here as the workshop completes them and shares them with you.</p>
    );
  return (
    <ul className="grid gap-3 sm:grid-cols-2">
      {findings.map((f) => (
        <li key={f.id}>
          <Link
            to={findingPath(f)}
            className="flex gap-3 overflow-hidden rounded-xl border border-rule bg-panel hover:border-glow"
            aria-label={`${f.componentRef ? `${f.componentRef}: ` : ''}${f.title} — ${f.status === 'verified' ? 'repaired and checked' : 'repaired'}`}
          >
            <span className="block h-24 w-24 shrink-0 sm:h-28 sm:w-28">
              <Closeup findingId={f.id} />
            </span>
            <span className="min-w-0 py-2 pr-3">
              <span className="block font-semibold break-words">
                {f.componentRef && <span className="font-mono">{f.componentRef} </span>}
                {f.title}
              </span>
              <span className="block text-sm text-ink-soft">{kindLabels[f.kind]}</span>
              <span className="mt-1 inline-flex items-center gap-1 text-sm font-semibold text-ok">
                <span aria-hidden="true">✓</span>
                {f.status === 'verified' ? 'Repaired and checked' : 'Repaired'}
              </span>
            </span>
          </Link>
        </li>
      ))}
    </ul>
  );
}
