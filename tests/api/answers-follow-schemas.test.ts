import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { sessionSchema } from '../../shared/schemas/auth';
import { bringupSchema } from '../../shared/schemas/bringup';
import { commentSchema } from '../../shared/schemas/comments';
import { activityItemSchema, timelineEventSchema } from '../../shared/schemas/events';
import {
  benchHelpRequestSchema,
  helpRequestSchema,
  helpRequestSummarySchema,
  sharedHelpSchema,
} from '../../shared/schemas/help';
import { findingChangeSchema, findingSchema, openQuestionSchema } from '../../shared/schemas/findings';
import { lineUpResultSchema, measurementSchema } from '../../shared/schemas/measurements';
import { invitationSchema, memberSchema } from '../../shared/schemas/members';
import { metaSchema } from '../../shared/schemas/meta';
import { notificationSchema } from '../../shared/schemas/notifications';
import { partSchema } from '../../shared/schemas/parts';
import { benchReadingRequestSchema, readingRequestSchema } from '../../shared/schemas/reading-requests';
import { restorationSchema } from '../../shared/schemas/restorations';
import { reportPreviewSchema, safetyStatusSchema, soakLogSchema } from '../../shared/schemas/safety';
import { symptomCheckSchema } from '../../shared/schemas/symptom-checks';
import { createPhotoRow } from '../factories/photos';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { startTestApp } from '../support/test-app';

// The client checks each answer against these schemas in development and tests (src/lib/api-client.ts); this holds the
// server to the same contract, so a development build never refuses a real answer.
let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent, mentor: Agent;
let id: number, bareId: number, photoId: number, findingId: number, helpId: number, helpToken: string;
beforeAll(async () => {
  t = await startTestApp();
  const [a, b] = await Promise.all([createUser(t.db), createUser(t.db)]);
  id = (
    await createRestoration(t.db, [
      { userId: a.id, role: 'technician' },
      { userId: b.id, role: 'mentor' },
    ])
  ).id;
  // The report embeds its photos' images; the photo row here has no stored object, so the preview is read on a set without photos.
  bareId = (await createRestoration(t.db, [{ userId: a.id, role: 'technician' }])).id;
  [tech, mentor] = await Promise.all([signedIn(t.app, a), signedIn(t.app, b)]);
  photoId = await createPhotoRow(t.db, id, true);
  const finding = await tech
    .post(`/api/photos/${photoId}/findings`)
    .send({ shape: 'pin', points: [{ x: 0.5, y: 0.5 }], title: 'C27 leaking', componentRef: 'C27' });
  findingId = finding.body.id;
  await tech.patch(`/api/findings/${findingId}`).send({ status: 'suspected', questionOpen: true });
  await mentor.post(`/api/findings/${findingId}/comments`).send({ body: 'Check the HT first', internal: true });
  await tech
    .post(`/api/restorations/${id}/parts`)
    .send({ componentRef: 'C27', originalRating: '0.022µF 350V', replacementRating: '0.022µF 630V' });
  await tech
    .post(`/api/restorations/${id}/measurements`)
    .send({ location: 'R23 cathode', quantity: 'resistance', expected: '150', reading: '212', findingId });
  await tech.put(`/api/restorations/${id}/symptom-checks/hum/smoothing-caps`).send({ result: 'ruled-out' });
  await mentor.post(`/api/restorations/${id}/reading-requests`).send({ kind: 'reading', body: 'HT at C27' });
  helpId = (await tech.post(`/api/restorations/${id}/help-requests`).send({ symptom: 'Hum' })).body.id;
  await tech.patch(`/api/help-requests/${helpId}`).send({ photoIds: [photoId], symptomIds: ['hum'] });
  helpToken = (await tech.post(`/api/help-requests/${helpId}/links`).send({})).body.token;
});
afterAll(() => t.stop());

const answers: [string, () => string, z.ZodType][] = [
  ['the session', () => '/api/auth/session', sessionSchema],
  ['the meta', () => '/api/meta', metaSchema],
  ['the restorations', () => '/api/restorations', z.array(restorationSchema)],
  ['a restoration', () => `/api/restorations/${id}`, restorationSchema],
  ['the members', () => `/api/restorations/${id}/members`, z.array(memberSchema)],
  ['the invitations', () => `/api/restorations/${id}/invitations`, z.array(invitationSchema)],
  ['the findings', () => `/api/restorations/${id}/findings`, z.array(findingSchema)],
  ['a photo’s findings', () => `/api/photos/${photoId}/findings`, z.array(findingSchema)],
  ['a finding', () => `/api/findings/${findingId}`, findingSchema],
  ['a finding’s history', () => `/api/findings/${findingId}/history`, z.array(findingChangeSchema)],
  ['a thread', () => `/api/findings/${findingId}/comments`, z.array(commentSchema)],
  ['the ledger', () => `/api/restorations/${id}/parts`, z.array(partSchema)],
  ['the readings', () => `/api/restorations/${id}/measurements`, z.array(measurementSchema)],
  ['the valve line-up', () => `/api/restorations/${id}/valves`, lineUpResultSchema],
  ['the timeline', () => `/api/restorations/${id}/events`, z.array(timelineEventSchema)],
  ['the activity', () => '/api/activity', z.array(activityItemSchema)],
  ['the bring-up', () => `/api/restorations/${id}/bringup`, bringupSchema],
  ['the safety tests', () => `/api/restorations/${id}/safety-tests`, safetyStatusSchema],
  ['the soak log', () => `/api/restorations/${id}/soak-sessions`, soakLogSchema],
  ['the report preview', () => `/api/restorations/${bareId}/report/preview`, reportPreviewSchema],
  ['the checklist results', () => `/api/restorations/${id}/symptom-checks`, z.array(symptomCheckSchema)],
  ['the requests for readings', () => `/api/restorations/${id}/reading-requests`, z.array(readingRequestSchema)],
  ['the bench’s requests for readings', () => '/api/reading-requests', z.array(benchReadingRequestSchema)],
  ['the help requests', () => `/api/restorations/${id}/help-requests`, z.array(helpRequestSummarySchema)],
  ['a help request', () => `/api/help-requests/${helpId}`, helpRequestSchema],
  ['the bench’s help requests', () => '/api/help-requests', z.array(benchHelpRequestSchema)],
];

describe('answers follow the shared schemas', () => {
  it.each(answers)(
    'when the technician reads %s, then the answer parses with its schema',
    async (_name, path, schema) => {
      const res = await tech.get(path());
      expect(res.status).toBe(200);
      expect(schema.safeParse(res.body).error).toBeUndefined();
    },
  );

  it('when someone reads a help request through its link, then the answer parses with its schema', async () => {
    const res = await anonymous(t.app).get(`/api/shared/help/${helpToken}`);
    expect(res.status).toBe(200);
    expect(res.body.photos).toHaveLength(1);
    expect(sharedHelpSchema.safeParse(res.body).error).toBeUndefined();
  });

  it('when the mentor reads notifications and open questions, then they parse with their schemas', async () => {
    const notifications = await mentor.get('/api/notifications');
    expect(z.array(notificationSchema).safeParse(notifications.body).error).toBeUndefined();
    const questions = await mentor.get('/api/questions');
    expect(questions.body).toHaveLength(1);
    expect(z.array(openQuestionSchema).safeParse(questions.body).error).toBeUndefined();
  });
});
