import { useId, useState } from 'react';
import {
  readingRequestKindLabels,
  readingRequestKinds,
  type ReadingRequestKind,
} from '../../../../shared/schemas/reading-requests';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { EmptyState, ErrorState, Loading } from '../../../components/states';
import { usePhotos } from '../../../lib/queries/get-photos';
import { useAnswerReadingRequest, useAskForReading, useReadingRequests } from '../api/reading-requests';
import { AnswerForm } from './answer-form';
import { ReadingRequestItem } from './reading-request-item';
import { LabelledOptions } from '../../../components/labelled-options';

/** Requests for readings: a mentor asks for something specific; the technician answers on the set. */
export function ReadingRequestsPanel({
  restorationId,
  helpRequestId,
  canAnswer,
}: {
  restorationId: number;
  helpRequestId?: number;
  canAnswer: boolean;
}) {
  const headingId = useId();
  const list = useReadingRequests(restorationId);
  const photos = usePhotos(restorationId);
  const ask = useAskForReading(restorationId);
  const answer = useAnswerReadingRequest(restorationId);
  const [kind, setKind] = useState<ReadingRequestKind>('reading');
  const [body, setBody] = useState('');
  return (
    <section aria-labelledby={headingId} className="space-y-3 rounded-xl border border-rule bg-panel p-4 print:hidden">
      <h2 id={headingId} className="text-lg font-bold">
        Requests for readings
      </h2>
      <form
        className="space-y-2"
        onSubmit={(e) => {
          e.preventDefault();
          ask.mutate({ kind, body, helpRequestId }, { onSuccess: () => setBody('') });
        }}
      >
        <div className="grid gap-2 sm:grid-cols-[10rem_1fr]">
          <label className="text-sm">
            Ask for
            <select className={inputClass} value={kind} onChange={(e) => setKind(e.target.value as ReadingRequestKind)}>
              <LabelledOptions values={readingRequestKinds} labels={readingRequestKindLabels} />
            </select>
          </label>
          <label className="text-sm">
            What, and where
            <input
              className={inputClass}
              value={body}
              onChange={(e) => setBody(e.target.value)}
              placeholder="e.g. Measure V3 pin 6 with no signal"
            />
          </label>
        </div>
        {ask.isError && (
          <p role="alert" className="font-semibold text-danger">
            {ask.error.message}
          </p>
        )}
        <Button type="submit" disabled={ask.isPending || !body.trim()}>
          {ask.isPending ? 'Asking…' : 'Ask the technician'}
        </Button>
      </form>
      {list.isPending ? (
        <Loading label="Loading requests…" />
      ) : list.isError ? (
        <ErrorState error={list.error} onRetry={() => list.refetch()} />
      ) : list.data.length === 0 ? (
        <EmptyState title="Nothing asked yet">
          A mentor can ask for a specific reading, photo or note; it waits on the technician's bench.
        </EmptyState>
      ) : (
        <ul className="space-y-3">
          {list.data.map((r) => (
            <li key={r.id} className="space-y-2 rounded-lg border border-rule p-3">
              <ReadingRequestItem request={r} />
              {canAnswer && !r.answeredAt && (
                <AnswerForm
                  request={r}
                  photos={photos.data ?? []}
                  pending={answer.isPending && answer.variables?.id === r.id}
                  onAnswer={(input) => answer.mutate({ id: r.id, input })}
                />
              )}
            </li>
          ))}
        </ul>
      )}
      {answer.isError && (
        <p role="alert" className="font-semibold text-danger">
          {answer.error.message}
        </p>
      )}
    </section>
  );
}
