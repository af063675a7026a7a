import { Link } from 'react-router';
import type { Photo } from '../../../../shared/schemas/photos';
import type { Restoration } from '../../../../shared/schemas/restorations';
import { setName } from '../lib/owner-words';
import { StageWords } from './stage-words';
import { photoSources } from '../../../lib/photo-sources';

/** One of several sets, as a card that opens its page (`to`); `hero` is its picture once known. */
export function OwnerSetCard({
  restoration: r,
  hero,
  to,
}: {
  restoration: Restoration;
  hero: Photo | undefined;
  to: string;
}) {
  return (
    <Link to={to} className="group block overflow-hidden rounded-2xl border border-rule bg-panel hover:border-glow">
      {hero ? (
        <img
          alt=""
          loading="lazy"
          decoding="async"
          {...photoSources(hero, '(min-width: 640px) 320px, calc(100vw - 32px)')}
          className="aspect-[4/3] w-full bg-sunken object-cover"
        />
      ) : (
        <span aria-hidden="true" className="block aspect-[4/3] w-full bg-sunken" />
      )}
      <span className="block space-y-2 p-4">
        <span className="block text-lg font-bold group-hover:underline">
          {setName(r)} {r.year && <span className="font-mono text-base font-normal text-ink-soft">{r.year}</span>}
        </span>
        <StageWords stage={r.stage} />
      </span>
    </Link>
  );
}
