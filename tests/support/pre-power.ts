import type { Agent } from 'supertest';
import { expect } from 'vitest';
import { prePowerItems } from '../../shared/schemas/bringup';

/** Signs off a restoration's pre-power checklist through the API (the first-power gate), every item done. */
export async function signOffPrePower(tech: Agent, restorationId: number) {
  for (const item of prePowerItems) {
    const body =
      item === 'isolation-transformer'
        ? { item, status: 'not-applicable', reason: 'Mains transformer, earthed chassis' }
        : { item, status: 'done' };
    expect((await tech.put(`/api/restorations/${restorationId}/bringup/pre-power`).send(body)).status).toBe(200);
  }
  expect((await tech.post(`/api/restorations/${restorationId}/bringup/pre-power/sign-off`)).status).toBe(200);
}
