import type { Agent, Response } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { passwordResetRequestedSchema, signUpResultSchema, userSchema } from '../../shared/schemas/auth';
import { commentSchema } from '../../shared/schemas/comments';
import { estimateSchema, workshopSettingsSchema } from '../../shared/schemas/estimates';
import { findingSchema } from '../../shared/schemas/findings';
import { invoicePreviewSchema, invoiceSchema } from '../../shared/schemas/invoices';
import { labourLogSchema } from '../../shared/schemas/labour';
import { lineUpResultSchema, measurementSchema } from '../../shared/schemas/measurements';
import { invitationAcceptedSchema, invitationSentSchema, memberSchema } from '../../shared/schemas/members';
import { partSchema } from '../../shared/schemas/parts';
import { paymentSchema, refundAnswerSchema } from '../../shared/schemas/payments';
import { photoSchema } from '../../shared/schemas/photos';
import { restorationSchema } from '../../shared/schemas/restorations';
import { reportSentSchema, safetyOverrideSchema, soakLogSchema } from '../../shared/schemas/safety';
import {
  mismatchNoteSchema,
  referenceMarkSchema,
  referenceSummarySchema,
  sheetPageSchema,
  sheetSchema,
} from '../../shared/schemas/sheets';
import { bringupSchema } from '../../shared/schemas/bringup';
import { writeWorkshopSettings } from '../../server/features/workshop/workshop-settings';
import { twoToneJpeg } from '../factories/images';
import { anonymous, createUser, signedIn } from '../factories/users';
import { tokenFrom, waitForMail } from '../support/mail';
import { startTestApp } from '../support/test-app';
import { workshopAdminsSchema } from '../../shared/schemas/workshop';

// The client names the schema of every answer, writes included, and checks it in development and tests
// (src/lib/api-client.ts); this holds the server's answers to writes and to the money and sheet lists to the same schemas.
let t: Awaited<ReturnType<typeof startTestApp>>;
let tech: Agent;
let id: number;
const settings = {
  currency: 'GBP',
  labourRate: 4000,
  partsMarkupBasisPoints: 2500,
  taxName: 'VAT',
  taxRateBasisPoints: 2000,
  taxRounding: 'invoice-down',
  estimateApprovalRequired: false,
  invoicePrefix: 'CL-',
  timeZone: 'Europe/London',
} as const;
beforeAll(async () => {
  t = await startTestApp();
  await writeWorkshopSettings(t.db, settings);
  tech = await signedIn(t.app, await createUser(t.db, { workshopAdmin: true }));
});
afterAll(() => t.stop());

/** The answer has the status expected and parses with its schema; returns its body for the next step. */
function follows<S extends z.ZodType>(res: Response, status: number, schema: S): z.output<S> {
  expect(res.status, JSON.stringify(res.body)).toBe(status);
  expect(schema.safeParse(res.body).error).toBeUndefined();
  return res.body as z.output<S>;
}
const mails = async () => (await t.request().get('/api/dev/mail')).body;

describe('answers to writes follow the shared schemas', () => {
  it('when a person signs up, asks for a reset and signs in, then each answer parses with its schema', async () => {
    const visitor = anonymous(t.app);
    const person = { name: 'Wren Solder', email: 'wren.solder@example.test', password: 'copper-braid-and-rosin' };
    follows(await visitor.post('/api/auth/sign-up').send(person), 202, signUpResultSchema);
    follows(
      await visitor.post('/api/auth/password-reset').send({ email: person.email }),
      202,
      passwordResetRequestedSchema,
    );
    const user = await createUser(t.db);
    follows(
      await anonymous(t.app).post('/api/auth/sign-in').send({ email: user.email, password: user.password }),
      200,
      userSchema,
    );
  });

  it('when the technician works on a restoration, then each write answers with its schema', async () => {
    const made = { make: 'Cobbold Lane', model: 'Lark 3', year: 1951 };
    id = follows(await tech.post('/api/restorations').send(made), 201, restorationSchema).id;
    follows(await tech.patch(`/api/restorations/${id}`).send({ stage: 'assessment' }), 200, restorationSchema);
    const photo = follows(
      await tech
        .post(`/api/restorations/${id}/photos`)
        .field('view', 'underside')
        .field('phase', 'before')
        .field('caption', 'As received')
        .field('ownerVisible', 'true')
        .attach('file', await twoToneJpeg(), 'underside.jpg'),
      201,
      photoSchema,
    );
    follows(await tech.patch(`/api/photos/${photo.id}`).send({ caption: 'Underside' }), 200, photoSchema);
    const pin = { shape: 'pin', points: [{ x: 0.5, y: 0.5 }], title: 'C27 leaking', componentRef: 'C27' };
    const finding = follows(await tech.post(`/api/photos/${photo.id}/findings`).send(pin), 201, findingSchema);
    follows(await tech.patch(`/api/findings/${finding.id}`).send({ status: 'suspected' }), 200, findingSchema);
    const comment = follows(
      await tech.post(`/api/findings/${finding.id}/comments`).send({ body: 'Leaky wax', internal: false }),
      201,
      commentSchema,
    );
    follows(await tech.patch(`/api/comments/${comment.id}`).send({ body: 'Leaky wax paper' }), 200, commentSchema);
    const part = follows(
      await tech.post(`/api/restorations/${id}/parts`).send({ componentRef: 'C27', replacementRating: '22nF 630V' }),
      201,
      partSchema,
    );
    follows(await tech.patch(`/api/parts/${part.id}`).send({ state: 'fitted' }), 200, partSchema);
    const reading = { location: 'R23 cathode', quantity: 'resistance', expected: '150', reading: '212' };
    const m = follows(await tech.post(`/api/restorations/${id}/measurements`).send(reading), 201, measurementSchema);
    follows(await tech.patch(`/api/measurements/${m.id}`).send({ reading: '151' }), 200, measurementSchema);
    const valves = { valves: [{ position: 'V1', type: 'UCH42' }] };
    follows(await tech.put(`/api/restorations/${id}/valves`).send(valves), 200, lineUpResultSchema);
    const intake = { item: 'valve-line-up', done: true };
    follows(await tech.put(`/api/restorations/${id}/bringup/intake`).send(intake), 200, bringupSchema);
    follows(await tech.post(`/api/restorations/${id}/soak-sessions`), 201, soakLogSchema);
    follows(await tech.patch(`/api/restorations/${id}/soak-sessions/running`).send({}), 200, soakLogSchema);
    const override = { reason: 'The owner takes it back for a museum shelf, never to be powered.' };
    follows(await tech.post(`/api/restorations/${id}/safety-override`).send(override), 201, safetyOverrideSchema);
  });

  it('when the technician notes the service sheet, then each write answers with its schema', async () => {
    const sheet = follows(
      await tech.post(`/api/restorations/${id}/sheets`).attach('file', await twoToneJpeg(), 'sheet.jpg'),
      201,
      sheetSchema,
    );
    const page = sheet.pages[0]!;
    follows(await tech.patch(`/api/sheet-pages/${page.id}`).send({ ownerVisible: true }), 200, sheetPageSchema);
    const mark = { sheetPageId: page.id, ref: 'R23', shape: 'pin', points: [{ x: 0.2, y: 0.2 }] };
    follows(await tech.post(`/api/restorations/${id}/reference-marks`).send(mark), 201, referenceMarkSchema);
    const note = follows(
      await tech.post(`/api/restorations/${id}/mismatch-notes`).send({ ref: 'R23', kind: 'misprint', note: '4k7' }),
      201,
      mismatchNoteSchema,
    );
    follows(await tech.patch(`/api/mismatch-notes/${note.id}`).send({ ownerVisible: true }), 200, mismatchNoteSchema);
    follows(await tech.get(`/api/restorations/${id}/sheets`), 200, z.array(sheetPageSchema));
    follows(await tech.get(`/api/restorations/${id}/reference-marks`), 200, z.array(referenceMarkSchema));
    follows(await tech.get(`/api/restorations/${id}/mismatch-notes`), 200, z.array(mismatchNoteSchema));
    follows(await tech.get(`/api/restorations/${id}/references`), 200, z.array(referenceSummarySchema));
  });

  it('when the technician invites an owner who accepts, then the invitation and the report answer with their schemas', async () => {
    const email = 'ivy.owner@example.test';
    follows(
      await tech.post(`/api/restorations/${id}/invitations`).send({ email, role: 'owner' }),
      201,
      invitationSentSchema,
    );
    const token = tokenFrom(await waitForMail(mails, email, /invited you/), 'invitations');
    const owner = await createUser(t.db, { email });
    const ownerAgent = await signedIn(t.app, owner);
    follows(await ownerAgent.post(`/api/invitations/${token}/accept`), 200, invitationAcceptedSchema);
    follows(
      await tech.patch(`/api/restorations/${id}/members/${owner.id}`).send({ role: 'owner' }),
      200,
      z.array(memberSchema),
    );
    follows(await tech.post(`/api/restorations/${id}/report/send`), 200, reportSentSchema);
  });

  it('when the technician quotes, logs time, bills and refunds, then each money answer follows its schema', async () => {
    const quote = { lines: [{ kind: 'labour', description: 'Recap', low: 60, high: 120 }], send: false };
    const estimate = follows(await tech.post(`/api/restorations/${id}/estimates`).send(quote), 201, estimateSchema);
    follows(await tech.post(`/api/estimates/${estimate.id}/send`), 200, estimateSchema);
    follows(await tech.get(`/api/restorations/${id}/estimates`), 200, z.array(estimateSchema));
    follows(await tech.get(`/api/restorations/${id}/money-settings`), 200, workshopSettingsSchema);
    follows(await tech.put('/api/workshop/settings').send(settings), 200, workshopSettingsSchema);
    follows(await tech.get('/api/workshop/settings'), 200, workshopSettingsSchema);
    follows(await tech.get('/api/workshop/admins'), 200, workshopAdminsSchema);
    const time = { minutes: 45, stage: 'repair' };
    follows(await tech.post(`/api/restorations/${id}/labour`).send(time), 201, labourLogSchema);
    follows(await tech.post(`/api/restorations/${id}/labour/timer`).send({ stage: 'repair' }), 201, labourLogSchema);
    follows(await tech.post(`/api/restorations/${id}/labour/timer/stop`), 200, labourLogSchema);
    follows(await tech.get(`/api/restorations/${id}/labour`), 200, labourLogSchema);
    follows(await tech.get(`/api/restorations/${id}/invoices/preview`), 200, invoicePreviewSchema);
    const deposit = follows(
      await tech.post(`/api/restorations/${id}/deposits`).send({ amount: 2000 }),
      201,
      invoiceSchema,
    );
    const cash = { amount: { amount: 2000, currency: 'GBP' }, method: 'cash', receivedOn: '2026-12-01' };
    const paid = follows(await tech.post(`/api/invoices/${deposit.id}/payments`).send(cash), 201, paymentSchema);
    follows(await tech.post(`/api/payments/${paid.id}/refund`).send({}), 201, refundAnswerSchema);
    follows(await tech.get(`/api/restorations/${id}/payments`), 200, z.array(paymentSchema));
    const final = follows(await tech.post(`/api/restorations/${id}/invoices`), 201, invoiceSchema);
    follows(await tech.post(`/api/invoices/${final.id}/void`).send({ reason: 'Wrong rate' }), 200, invoiceSchema);
    follows(await tech.get(`/api/restorations/${id}/invoices`), 200, z.array(invoiceSchema));
  });
});
