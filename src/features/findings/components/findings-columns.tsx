import { createColumnHelper, type FilterFn, type SortingFn } from '@tanstack/react-table';
import { Link } from 'react-router';
import { findingPath, kindLabels, severities, statuses, type Finding } from '../../../../shared/schemas/findings';
import { byComponentRef } from '../../../lib/table-sorting';
import { fullTime, relativeTime } from './finding-format';
import { SeverityMark, StatusMark } from '../../../components/status-mark';

const helper = createColumnHelper<Finding>();

/** Sorts by a fixed order (the workflow for status, gravest first for severity) rather than by the words. */
const byOrder =
  (order: readonly string[]): SortingFn<Finding> =>
  (a, b, id) =>
    order.indexOf(a.getValue<string>(id)) - order.indexOf(b.getValue<string>(id));

const byText =
  (text: (f: Finding) => string): SortingFn<Finding> =>
  (a, b) =>
    text(a.original).localeCompare(text(b.original));

const blank = (value: unknown) => value === undefined || value === '';

const equalsFilter: FilterFn<Finding> = (row, id, value) => row.getValue(id) === value;
equalsFilter.autoRemove = blank;

const refContainsFilter: FilterFn<Finding> = (row, _id, value: string) =>
  row.original.componentRef.toLowerCase().includes(value.trim().toLowerCase());
refContainsFilter.autoRemove = (value) => blank(typeof value === 'string' ? value.trim() : value);

/** The findings table's columns; `photoLabel` names a photo the way the route words it ("Underside · before"). */
export function findingColumns(photoLabel: (photoId: number) => string) {
  return [
    helper.accessor('number', {
      header: '#',
      cell: (c) => <span className="font-mono font-semibold">#{c.getValue()}</span>,
    }),
    helper.accessor('status', {
      header: 'Status',
      cell: (c) => <StatusMark status={c.getValue()} />,
      sortingFn: byOrder(statuses),
      filterFn: equalsFilter,
    }),
    helper.accessor('severity', {
      header: 'Severity',
      cell: (c) => <SeverityMark severity={c.getValue()} />,
      sortingFn: byOrder(severities),
      filterFn: equalsFilter,
    }),
    helper.accessor('kind', {
      header: 'Kind',
      cell: (c) => kindLabels[c.getValue()],
      sortingFn: byText((f) => kindLabels[f.kind]),
      filterFn: equalsFilter,
    }),
    // Findings without a reference go last whichever way the column is sorted.
    helper.accessor((f) => f.componentRef || undefined, {
      id: 'componentRef',
      header: 'Component',
      cell: (c) => <span className="font-mono">{c.getValue() ?? '—'}</span>,
      sortingFn: byComponentRef,
      sortUndefined: 'last',
      filterFn: refContainsFilter,
    }),
    helper.accessor('title', {
      header: 'Title',
      cell: (c) => (
        <Link to={findingPath(c.row.original)} className="font-semibold underline-offset-2 hover:underline">
          {c.getValue()}
        </Link>
      ),
      sortingFn: byText((f) => f.title),
    }),
    helper.accessor('photoId', {
      id: 'photo',
      header: 'Photo',
      cell: (c) => photoLabel(c.getValue()),
      sortingFn: byText((f) => photoLabel(f.photoId)),
      filterFn: equalsFilter,
    }),
    helper.accessor('commentCount', {
      header: 'Comments',
      cell: (c) => <span className="font-mono">{c.getValue()}</span>,
    }),
    helper.accessor('updatedAt', {
      header: 'Updated',
      cell: (c) => (
        <time dateTime={c.getValue()} title={fullTime(c.getValue())} className="whitespace-nowrap">
          {relativeTime(c.getValue())}
        </time>
      ),
      sortingFn: byText((f) => f.updatedAt),
    }),
    // A crop of the marked spot, cut from the original and cached in storage by the server.
    helper.display({
      id: 'closeup',
      header: () => <span className="sr-only">Close-up</span>,
      cell: (c) => (
        <img
          src={`/api/findings/${c.row.original.id}/closeup`}
          alt=""
          loading="lazy"
          width={48}
          height={48}
          className="h-12 w-12 rounded-md border border-rule bg-sunken object-cover"
        />
      ),
    }),
  ];
}
