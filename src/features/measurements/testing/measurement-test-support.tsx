import { BenchInputError } from '../../../../shared/bench';
import type { LineUp, Measurement, MeasurementInput } from '../../../../shared/schemas/measurements';
import { makeMeasurement } from './measurement-fixtures';
import { apiError, fakeApi, notFound, toResponse } from '../../../testing/fake-api';

export interface Call {
  method: string;
  url: string;
  body: unknown;
}

const json = (status: number, body: unknown) =>
  new Response(body === undefined ? null : JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
const refuse = (message: string) => toResponse(apiError(400, message));

/**
 * Stands in for the API behind `fetch`: readings are judged by the bench library as the server does (a value it
 * cannot read is a 400 in its words); `refuseLocations` makes the server refuse those points. Every call is recorded.
 */
export function fakeReadingsApi(
  initial: Measurement[],
  { lineUp, refuseLocations = [] }: { lineUp?: LineUp; refuseLocations?: string[] } = {},
) {
  let list = [...initial];
  let valves: LineUp = lineUp ?? { valves: [], liveChassis: { likely: false, reasons: [] } };
  let nextId = 100;
  const calls: Call[] = [];
  const { fetchMock } = fakeApi(async ({ method, path, body }) => {
    const url = `/api${path}`;
    calls.push({ method, url, body });
    const findingId = Number(/findingId=(\d+)/.exec(url)?.[1]);
    if (/\/measurements(\?|$)/.test(url) && method === 'GET')
      return json(200, findingId ? list.filter((m) => m.findingId === findingId) : list);
    if (url.endsWith('/measurements') && method === 'POST') {
      const input = body as MeasurementInput;
      if (refuseLocations.includes(input.location)) return refuse('Reading: the server would not take this one.');
      try {
        const made = makeMeasurement(nextId++, input);
        list = [...list, made];
        return json(201, made);
      } catch (error) {
        if (error instanceof BenchInputError) return refuse(error.message);
        throw error;
      }
    }
    const id = Number(/\/api\/measurements\/(\d+)$/.exec(url)?.[1]);
    if (method === 'PATCH') {
      list = list.map((m) =>
        m.id === id
          ? makeMeasurement(id, {
              location: m.location,
              quantity: m.quantity,
              expected: m.expectedText,
              tolerance: m.toleranceText,
              rating: m.ratingText,
              reading: m.readingText,
              conditions: m.conditions,
              method: m.method,
              findingId: m.findingId,
              ownerVisible: m.ownerVisible,
              ...(body as Partial<MeasurementInput>),
            })
          : m,
      );
      return json(
        200,
        list.find((m) => m.id === id),
      );
    }
    if (method === 'DELETE') {
      list = list.filter((m) => m.id !== id);
      return new Response(null, { status: 204 });
    }
    if (url.endsWith('/valves') && method === 'GET') return json(200, valves);
    if (url.endsWith('/valves') && method === 'PUT') {
      const series = (body as LineUp).valves.filter((v) => /^U/i.test(v.type));
      valves = {
        valves: (body as LineUp).valves,
        liveChassis: { likely: series.length > 0, reasons: series.map((v) => `${v.type}: series heater`) },
      };
      return json(200, valves);
    }
    return toResponse(notFound());
  });
  return { calls, fetchMock };
}
