import { messageOf } from './read-quantity';

/** A calculator's result: waiting for input, worked out, or refused by the library with its reason. */
export type Outcome<T> = { status: 'waiting' } | { status: 'ready'; value: T } | { status: 'refused'; message: string };

type Known<T extends readonly unknown[]> = { -readonly [K in keyof T]: Exclude<T[K], undefined> };

/**
 * Runs `work` once every input is known. Formatting belongs inside `work` too, so that a value the
 * formatter refuses (an overflow to infinity, say) becomes a readable message instead of a crash.
 */
export function calculate<const T extends readonly unknown[], R>(inputs: T, work: (values: Known<T>) => R): Outcome<R> {
  if (inputs.some((input) => input === undefined)) return { status: 'waiting' };
  try {
    return { status: 'ready', value: work(inputs as unknown as Known<T>) };
  } catch (error) {
    return { status: 'refused', message: messageOf(error) };
  }
}
