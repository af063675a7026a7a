import type { ReactNode } from 'react';
import type { HelpContent } from '../../../../shared/schemas/help';
import { VerdictBadge } from '../../../components/verdict-badge';
import { HelpChecklistView } from './help-checklist-view';
import { HelpPhotoFigure } from './help-photo';

const Section = ({ title, children }: { title: string; children: ReactNode }) => (
  <section className="break-inside-avoid space-y-2">
    <h2 className="text-lg font-bold">{title}</h2>
    {children}
  </section>
);

const cell = 'border-b border-rule px-2 py-1 text-left align-top';

/** A help request as its reader may see it: the same view in the workshop, on the link and on paper. */
export function HelpContentView({
  content,
  extra,
  removeSymptom,
}: {
  content: HelpContent;
  extra?: (section: 'readings' | 'parts' | 'photos', id: number) => ReactNode;
  removeSymptom?: (symptomId: string) => ReactNode;
}) {
  const { set } = content;
  return (
    <div className="space-y-6">
      <Section title="The symptom">
        <p className="whitespace-pre-wrap">{content.symptom}</p>
      </Section>
      {set && (
        <Section title="The set">
          <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
            <dt className="text-ink-soft">Make and model</dt>
            <dd>
              {set.make} {set.model}
              {set.year ? ` (${set.year})` : ''}
            </dd>
            {set.chassis && (
              <>
                <dt className="text-ink-soft">Chassis / serial</dt>
                <dd className="font-mono">{set.chassis}</dd>
              </>
            )}
            {set.mains && (
              <>
                <dt className="text-ink-soft">Mains</dt>
                <dd>{set.mains}</dd>
              </>
            )}
            {set.liveChassis && (
              <>
                <dt className="text-ink-soft">Chassis</dt>
                <dd className="font-semibold text-danger">
                  Live chassis (AC/DC): work through an isolating transformer.
                </dd>
              </>
            )}
          </dl>
        </Section>
      )}
      {content.valves && content.valves.length > 0 && (
        <Section title="Valve line-up">
          <p className="font-mono">{content.valves.map((v) => `${v.position} ${v.type}`).join(' · ')}</p>
        </Section>
      )}
      {content.checklist.length > 0 && (
        <Section title="What was checked">
          <HelpChecklistView checklist={content.checklist} remove={removeSymptom} />
        </Section>
      )}
      {content.parts.length > 0 && (
        <Section title="Parts already changed">
          <table className="w-full border-collapse text-sm">
            <thead>
              <tr>
                <th className={cell}>Ref</th>
                <th className={cell}>Was</th>
                <th className={cell}>Now</th>
                <th className={cell} />
              </tr>
            </thead>
            <tbody>
              {content.parts.map((p) => (
                <tr key={p.id}>
                  <td className={`${cell} font-mono`}>{p.componentRef}</td>
                  <td className={cell}>{p.old || '—'}</td>
                  <td className={cell}>{p.new || p.action}</td>
                  <td className={cell}>{extra?.('parts', p.id)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </Section>
      )}
      {content.readings.length > 0 && (
        <Section title="Readings">
          <table className="w-full border-collapse text-sm">
            <thead>
              <tr>
                <th className={cell}>Where</th>
                <th className={cell}>Expected</th>
                <th className={cell}>Read</th>
                <th className={cell}>Verdict</th>
                <th className={cell}>Meter</th>
                <th className={cell} />
              </tr>
            </thead>
            <tbody>
              {content.readings.map((m) => (
                <tr key={m.id}>
                  <td className={cell}>
                    {m.location}
                    <span className="block text-xs text-ink-soft">
                      {m.quantity}
                      {m.conditions && ` · ${m.conditions}`}
                    </span>
                  </td>
                  <td className={`${cell} font-mono`}>
                    {m.expected || '—'}
                    {m.tolerance && ` ± ${m.tolerance}`}
                  </td>
                  <td className={`${cell} font-mono`}>{m.reading}</td>
                  <td className={cell}>
                    <VerdictBadge verdict={m.verdict} reason={m.verdictReason} />
                  </td>
                  <td className={cell}>
                    {m.meter || '—'}
                    {m.chartMeter && (
                      <span className="block text-xs text-ink-soft">chart taken with {m.chartMeter}</span>
                    )}
                  </td>
                  <td className={cell}>{extra?.('readings', m.id)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </Section>
      )}
      {content.mismatches.length > 0 && (
        <Section title="Where the chassis differs from the diagram">
          <ul className="list-disc space-y-1 pl-5">
            {content.mismatches.map((m) => (
              <li key={m.id}>{m.line}</li>
            ))}
          </ul>
        </Section>
      )}
      {content.photos.length > 0 && (
        <Section title="Photos">
          <div className="grid gap-6 md:grid-cols-2 print:grid-cols-2">
            {content.photos.map((p) => (
              <div key={p.id} className="space-y-1">
                <HelpPhotoFigure photo={p} />
                {extra?.('photos', p.id)}
              </div>
            ))}
          </div>
        </Section>
      )}
    </div>
  );
}
