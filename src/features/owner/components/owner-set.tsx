import type { ReactNode } from 'react';
import type { Photo } from '../../../../shared/schemas/photos';
import type { Restoration } from '../../../../shared/schemas/restorations';
import { setName } from '../lib/owner-words';
import { HeroPhoto } from './hero-photo';
import { ReportLink } from './report-link';
import { LiveChassisNote } from './safety-reminder';
import { StageWords } from './stage-words';

function Part({ id, title, children }: { id: string; title: string; children: ReactNode }) {
  return (
    <section aria-labelledby={id} className="space-y-3">
      <h3 id={id} className="text-xl font-bold">
        {title}
      </h3>
      {children}
    </section>
  );
}

/**
 * One set as its owner follows it: picture, name, where it stands, its story, before and after, what was repaired,
 * the care notes, the history and the report. The route fills the slots (comparisons, repairs, timeline) so this
 * page stays free of other features' components.
 */
export function OwnerSet({
  restoration: r,
  hero,
  comparisons,
  repairs,
  timeline,
  payments,
}: {
  restoration: Restoration;
  /** The picture at the top; undefined while none is shared. */
  hero: Photo | undefined;
  /** Before/after comparisons (or their loading or error state); null hides the part. */
  comparisons: ReactNode;
  /** The repaired findings (or their loading or error state). */
  repairs: ReactNode;
  timeline: ReactNode;
  /** Deposit requests and invoices to pay, and the payments made; undefined hides the part. */
  payments?: ReactNode;
}) {
  const name = setName(r);
  const ids = (part: string) => `set-${r.id}-${part}`;
  return (
    <article aria-labelledby={ids('name')} className="space-y-8">
      <div className="space-y-4">
        <HeroPhoto photo={hero} name={name} />
        <div className="space-y-2">
          <h2 id={ids('name')} className="text-2xl font-bold">
            {name} {r.year && <span className="font-mono text-lg font-normal text-ink-soft">{r.year}</span>}
          </h2>
          <StageWords stage={r.stage} />
        </div>
        <ReportLink restorationId={r.id} />
      </div>
      {payments && (
        <Part id={ids('payments')} title="Paying for the work">
          {payments}
        </Part>
      )}
      {r.story && (
        <Part id={ids('story')} title="Its story">
          <p className="leading-relaxed whitespace-pre-line">{r.story}</p>
        </Part>
      )}
      {comparisons && (
        <Part id={ids('before-after')} title="Before and after">
          {comparisons}
        </Part>
      )}
      <Part id={ids('repairs')} title="What was put right">
        {repairs}
      </Part>
      {(r.careNotes || r.liveChassis) && (
        <Part id={ids('care')} title="Looking after it">
          {r.liveChassis && <LiveChassisNote />}
          {r.careNotes && <p className="leading-relaxed whitespace-pre-line">{r.careNotes}</p>}
        </Part>
      )}
      <Part id={ids('history')} title="Day by day">
        {timeline}
      </Part>
    </article>
  );
}
