import { created, noContent, ok, type Reply } from './fake-api';

/**
 * The rows of one collection behind `fakeApi`, answering as the server does: `list` for GET, `add` a row made from
 * what was posted (201), `change` one (200 with the row as it now is), `remove` one (204). New rows get ids from 100;
 * without `make`, rows are only listed, changed and removed.
 */
export function fakeRows<Row extends { id: number }, Input>(
  initial: readonly Row[],
  { make, remake }: { make?: (id: number, input: Input) => Row; remake: (row: Row, change: Partial<Input>) => Row },
) {
  let rows = [...initial];
  let nextId = 100;
  return {
    list: () => rows,
    add(input: Input): Reply {
      if (!make) throw new Error('These rows are not made through the fake API.');
      const row = make(nextId++, input);
      rows = [...rows, row];
      return created(row);
    },
    change(id: number, change: Partial<Input>): Reply {
      rows = rows.map((row) => (row.id === id ? remake(row, change) : row));
      return ok(rows.find((row) => row.id === id));
    },
    remove(id: number): Reply {
      rows = rows.filter((row) => row.id !== id);
      return noContent();
    },
  };
}

/** The id at the end of a path such as `/parts/3`, or NaN. */
export const idAtEnd = (path: string) => Number(/\/(\d+)$/.exec(path)?.[1]);
