import { BenchInputError } from '../../../../shared/bench';
import type { LineUp, Measurement, MeasurementInput } from '../../../../shared/schemas/measurements';
import { makeMeasurement } from './measurement-fixtures';
import { inputOf } from '../lib/measurement-input';
import { apiError, fakeApi, ok } from '../../../testing/fake-api';
import { fakeRows, idAtEnd } from '../../../testing/fake-rows';

const refuse = (message: string) => apiError(400, message);

/**
 * Stands in for the API behind `fetch`: readings are judged by the bench library as the server does (a value it
 * cannot read is a 400 in its words); `refuseLocations` makes the server refuse those points. Every call is recorded.
 */
export function fakeReadingsApi(
  initial: Measurement[],
  { lineUp, refuseLocations = [] }: { lineUp?: LineUp; refuseLocations?: string[] } = {},
) {
  const readings = fakeRows<Measurement, MeasurementInput & { findingId?: number | null }>(initial, {
    make: makeMeasurement,
    remake: (m, change) => makeMeasurement(m.id, { ...inputOf(m), ...change }),
  });
  let valves: LineUp = lineUp ?? { valves: [], liveChassis: { likely: false, reasons: [] } };
  const api = fakeApi(({ method, path, body }) => {
    const findingId = Number(/findingId=(\d+)/.exec(path)?.[1]);
    if (/\/measurements(\?|$)/.test(path) && method === 'GET')
      return ok(findingId ? readings.list().filter((m) => m.findingId === findingId) : readings.list());
    if (path.endsWith('/measurements') && method === 'POST') {
      const input = body as MeasurementInput;
      if (refuseLocations.includes(input.location)) return refuse('Reading: the server would not take this one.');
      try {
        return readings.add(input);
      } catch (error) {
        if (error instanceof BenchInputError) return refuse(error.message);
        throw error;
      }
    }
    if (/^\/measurements\/\d+$/.test(path) && method === 'PATCH')
      return readings.change(idAtEnd(path), body as Partial<MeasurementInput>);
    if (/^\/measurements\/\d+$/.test(path) && method === 'DELETE') return readings.remove(idAtEnd(path));
    if (path.endsWith('/valves') && method === 'GET') return ok(valves);
    if (path.endsWith('/valves') && method === 'PUT') {
      const series = (body as LineUp).valves.filter((v) => /^U/i.test(v.type));
      valves = {
        valves: (body as LineUp).valves,
        liveChassis: { likely: series.length > 0, reasons: series.map((v) => `${v.type}: series heater`) },
      };
      return ok(valves);
    }
    return undefined;
  });
  return { calls: api.urlCalls, fetchMock: api.fetchMock };
}
