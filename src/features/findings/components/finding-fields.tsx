import { useState, type ReactNode } from 'react';
import {
  kindLabels,
  kinds,
  severities,
  severityLabels,
  type Finding,
  type FindingPatch,
} from '../../../../shared/schemas/findings';
import { Field, inputClass } from '../../../components/field';
import { checkComponentRef, checkTitle } from './finding-edit';
import { InlineTextField } from './inline-text-field';
import { SameReferenceFinding } from './same-reference-finding';
import { SeverityMark, StatusMark } from '../../../components/status-mark';
import { StatusButtons } from './status-buttons';
import { LabelledOptions } from '../../../components/labelled-options';

const sameRef = (a: string, b: string) => a.trim().toUpperCase() === b.trim().toUpperCase();

/**
 * What a person who may change the finding edits: each field saves on its own. A reference another finding
 * already names is pointed out with a link to that one as it is typed, and named quietly once saved; it is never refused.
 */
export function FindingFields({ finding, onSave }: { finding: Finding; onSave: (patch: FindingPatch) => void }) {
  const [typedRef, setTypedRef] = useState<string | null>(null);
  return (
    <div className="space-y-3">
      <InlineTextField label="Title" value={finding.title} check={checkTitle} onSave={(title) => onSave({ title })} />
      <div className="grid gap-3 sm:grid-cols-[9rem_1fr]">
        <InlineTextField
          label="Component"
          hint="As on the schematic"
          mono
          value={finding.componentRef}
          check={checkComponentRef}
          onSave={(componentRef) => onSave({ componentRef })}
          onDraft={setTypedRef}
        />
        <Field label="Kind" hint="What was seen">
          {(a) => (
            <select
              {...a}
              value={finding.kind}
              onChange={(e) => onSave({ kind: e.target.value as Finding['kind'] })}
              className={inputClass}
            >
              <LabelledOptions values={kinds} labels={kindLabels} />
            </select>
          )}
        </Field>
      </div>
      {(typedRef ?? finding.componentRef).trim() !== '' && (
        <SameReferenceFinding
          restorationId={finding.restorationId}
          componentRef={typedRef ?? finding.componentRef}
          exceptId={finding.id}
          settled={typedRef === null || sameRef(typedRef, finding.componentRef)}
        />
      )}
      <Field label="Severity">
        {(a) => (
          <select
            {...a}
            value={finding.severity}
            onChange={(e) => onSave({ severity: e.target.value as Finding['severity'] })}
            className={inputClass}
          >
            <LabelledOptions values={severities} labels={severityLabels} />
          </select>
        )}
      </Field>
      <StatusButtons status={finding.status} onChange={onSave} />
    </div>
  );
}

function Row({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-wrap gap-x-3 py-1.5">
      <dt className="w-28 shrink-0 text-ink-soft">{term}</dt>
      <dd className="min-w-0 flex-1">{children}</dd>
    </div>
  );
}

/** The same facts for someone who reads them only. */
export function FindingSummary({ finding }: { finding: Finding }) {
  return (
    <dl className="divide-y divide-rule">
      <Row term="Component">
        {finding.componentRef ? (
          <span className="font-mono">{finding.componentRef}</span>
        ) : (
          <span className="text-ink-soft">none</span>
        )}
      </Row>
      <Row term="Kind">{kindLabels[finding.kind]}</Row>
      <Row term="Severity">
        <SeverityMark severity={finding.severity} />
      </Row>
      <Row term="Status">
        <StatusMark status={finding.status} />
      </Row>
    </dl>
  );
}
