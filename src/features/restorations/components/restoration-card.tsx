import { Link } from 'react-router';
import { equipmentKindLabels, type Restoration } from '../../../../shared/schemas/restorations';

export function RestorationCard({ restoration: r }: { restoration: Restoration }) {
  return (
    <li>
      <Link
        to={`/restorations/${r.id}`}
        className="block rounded-xl border border-rule bg-panel p-4 shadow-sm transition hover:border-glow hover:shadow-md"
      >
        <div className="flex items-start justify-between gap-2">
          <h3 className="text-lg leading-tight font-bold">
            {r.make} <span className="font-semibold">{r.model}</span>
          </h3>
          {r.year && <span className="font-mono text-sm text-ink-soft">{r.year}</span>}
        </div>
        <p className="mt-1 text-sm text-ink-soft">
          {equipmentKindLabels[r.equipmentKind]}
          {r.serial && (
            <>
              {' · '}
              <span className="font-mono">{r.serial}</span>
            </>
          )}
        </p>
        {r.liveChassis && (
          <p className="mt-2 inline-flex items-center gap-1 rounded bg-danger-soft px-2 py-0.5 text-xs font-bold text-danger">
            <span aria-hidden="true">⚡</span> Live chassis
          </p>
        )}
        {r.symptoms && <p className="mt-2 line-clamp-2 text-sm">“{r.symptoms}”</p>}
      </Link>
    </li>
  );
}
