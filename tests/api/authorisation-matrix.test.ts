import { randomBytes } from 'node:crypto';
import { eq } from 'drizzle-orm';
import type { Agent } from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { invitationsRepo } from '../../server/features/invitations/invitations.repo';
import { photosRepo } from '../../server/features/photos/photos.repo';
import { photoKeys } from '../../server/features/photos/photo-objects';
import { measurementsService } from '../../server/features/measurements/measurements.service';
import { partsService } from '../../server/features/parts/parts.service';
import { referencesRepo } from '../../server/features/references/references.repo';
import { sheetsRepo } from '../../server/features/sheets/sheets.repo';
import { mismatchesRepo } from '../../server/features/mismatches/mismatches.repo';
import { commentsRepo } from '../../server/features/comments/comments.repo';
import { estimatesService } from '../../server/features/estimates/estimates.service';
import { invoicesService } from '../../server/features/invoices/invoices.service';
import { paymentsService } from '../../server/features/payments/payments.service';
import { findingsRepo } from '../../server/features/findings/findings.repo';
import { helpRepo } from '../../server/features/help/help.repo';
import { newToken } from '../../server/features/auth/tokens';
import {
  comments,
  events,
  findings,
  measurements,
  memberships,
  notifications,
  parts,
  photos,
  readingRequests,
} from '../../server/db/schema';
import { twoToneJpeg } from '../factories/images';
import { createRestoration } from '../factories/restorations';
import { anonymous, createUser, signedIn } from '../factories/users';
import { listApiRoutes } from '../support/list-routes';
import { pdfText } from '../support/pdf-text';
import { startTestApp } from '../support/test-app';

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
type Expect = [technician: number, mentor: number, owner: number, nonMember: number, signedOut: number];
type Fixture = {
  id: number;
  userId: number;
  invitationId: number;
  token: string;
  photoId: number;
  findingId: number;
  commentId: number;
  measurementId: number;
  partId: number;
  pageId: number;
  markId: number;
  noteId: number;
  helpRequestId: number;
  helpToken: string;
  replyId: number;
  estimateId: number;
  draftEstimateId: number;
  invoiceId: number;
  symptomId: string;
  causeId: string;
  readingRequestId: number;
  paymentId: number;
};
/** A body is JSON, or a Buffer sent as the multipart field `file`. */
type Row = [Method, string, Expect, ((f: Fixture) => object | Buffer)?, 'fresh people'?];

const unique = () => `m-${randomBytes(4).toString('hex')}@example.test`;

/**
 * Every API route × every kind of caller → the exact status. A route the app registers but this table
 * lacks fails the last test, so adding a route means adding one line here.
 */
const matrix: Row[] = [
  ['GET', '/api/health', [200, 200, 200, 200, 200]],
  ['GET', '/api/meta', [200, 200, 200, 200, 200]],
  ['GET', '/api/dev/mail', [200, 200, 200, 200, 200]],
  [
    'POST',
    '/api/auth/sign-up',
    [202, 202, 202, 202, 202],
    () => ({ name: 'New', email: unique(), password: 'a quiet chassis hum' }),
  ],
  ['POST', '/api/auth/sign-in', [401, 401, 401, 401, 401], () => ({ email: unique(), password: 'not the password' })],
  ['POST', '/api/auth/sign-out', [204, 204, 204, 204, 204]],
  ['GET', '/api/auth/me', [200, 200, 200, 200, 401]],
  ['GET', '/api/auth/session', [200, 200, 200, 200, 200]],
  ['POST', '/api/auth/confirm-email', [410, 410, 410, 410, 410], () => ({ token: 'x'.repeat(43) })],
  ['POST', '/api/auth/password-reset', [202, 202, 202, 202, 202], () => ({ email: unique() })],
  [
    'POST',
    '/api/auth/password-reset/confirm',
    [410, 410, 410, 410, 410],
    () => ({ token: 'x'.repeat(43), password: 'a quiet chassis hum' }),
  ],
  ['GET', '/api/restorations', [200, 200, 200, 200, 401]],
  ['POST', '/api/restorations', [201, 201, 201, 201, 401], () => ({ make: 'Farrowby', model: 'Lark' })],
  ['GET', '/api/restorations/:id', [200, 200, 200, 404, 401]],
  ['PATCH', '/api/restorations/:id', [200, 403, 403, 404, 401], () => ({ stage: 'repair' })],
  // The fixture has an issued deposit request, which the workshop's accounts keep: deleting the set is refused.
  ['DELETE', '/api/restorations/:id', [409, 403, 403, 404, 401]],
  ['GET', '/api/restorations/:id/members', [200, 200, 200, 404, 401]],
  ['PATCH', '/api/restorations/:id/members/:userId', [200, 403, 403, 404, 401], () => ({ role: 'mentor' })],
  ['DELETE', '/api/restorations/:id/members/:userId', [204, 403, 403, 404, 401]],
  ['GET', '/api/restorations/:id/invitations', [200, 403, 403, 404, 401]],
  ['POST', '/api/restorations/:id/invitations', [201, 403, 403, 404, 401], () => ({ email: unique(), role: 'mentor' })],
  ['POST', '/api/restorations/:id/invitations/:invitationId/resend', [204, 403, 403, 404, 401]],
  ['DELETE', '/api/restorations/:id/invitations/:invitationId', [204, 403, 403, 404, 401]],
  ['GET', '/api/invitations/:token', [200, 200, 200, 200, 200]],
  // The invitation is addressed to nobody here, so every signed-in caller is the wrong account.
  ['POST', '/api/invitations/:token/accept', [403, 403, 403, 403, 401]],
  ['GET', '/api/restorations/:id/photos', [200, 200, 200, 404, 401]],
  ['POST', '/api/restorations/:id/photos', [201, 403, 403, 404, 401], () => jpeg],
  // The fixture's photo is not shared with the owner, so for them it does not exist.
  ['GET', '/api/photos/:photoId', [200, 200, 404, 404, 401]],
  ['PATCH', '/api/photos/:photoId', [200, 403, 404, 404, 401], () => ({ caption: 'R23 area' })],
  ['DELETE', '/api/photos/:photoId', [204, 403, 404, 404, 401]],
  // The fixture's finding is the technician's, on the unshared photo, with one internal comment by the technician.
  ['GET', '/api/photos/:photoId/findings', [200, 200, 404, 404, 401]],
  [
    'POST',
    '/api/photos/:photoId/findings',
    [201, 201, 404, 404, 401],
    () => ({ shape: 'pin', points: [{ x: 0.5, y: 0.5 }], title: 'Dry joint?' }),
  ],
  ['GET', '/api/restorations/:id/findings', [200, 200, 200, 404, 401]],
  ['GET', '/api/findings/:findingId', [200, 200, 404, 404, 401]],
  ['PATCH', '/api/findings/:findingId', [200, 403, 404, 404, 401], () => ({ status: 'suspected' })],
  ['DELETE', '/api/findings/:findingId', [204, 403, 404, 404, 401]],
  ['GET', '/api/findings/:findingId/history', [200, 200, 404, 404, 401]],
  ['GET', '/api/findings/:findingId/closeup', [302, 302, 404, 404, 401]],
  ['GET', '/api/findings/:findingId/comments', [200, 200, 404, 404, 401]],
  ['POST', '/api/findings/:findingId/comments', [201, 201, 404, 404, 401], () => ({ body: 'Measured 1.2 kΩ' })],
  ['PATCH', '/api/comments/:commentId', [200, 403, 404, 404, 401], () => ({ body: 'Measured 1.3 kΩ' })],
  ['DELETE', '/api/comments/:commentId', [204, 403, 404, 404, 401]],
  ['GET', '/api/notifications', [200, 200, 200, 200, 401]],
  ['POST', '/api/notifications/read', [204, 204, 204, 204, 401], () => ({})],
  ['GET', '/api/questions', [200, 200, 200, 200, 401]],
  // The fixture's measurement is not shared with the owner.
  ['GET', '/api/restorations/:id/measurements', [200, 200, 200, 404, 401]],
  [
    'POST',
    '/api/restorations/:id/measurements',
    [201, 403, 403, 404, 401],
    () => ({ location: 'R23', quantity: 'resistance', expected: '150', reading: '212' }),
  ],
  ['PATCH', '/api/measurements/:measurementId', [200, 403, 404, 404, 401], () => ({ reading: '151' })],
  ['DELETE', '/api/measurements/:measurementId', [204, 403, 404, 404, 401]],
  ['GET', '/api/restorations/:id/valves', [200, 200, 200, 404, 401]],
  [
    'PUT',
    '/api/restorations/:id/valves',
    [200, 403, 403, 404, 401],
    () => ({ valves: [{ position: 'V1', type: 'EL84' }] }),
  ],
  ['GET', '/api/restorations/:id/parts', [200, 200, 200, 404, 401]],
  ['GET', '/api/restorations/:id/parts.csv', [200, 200, 200, 404, 401]],
  [
    'POST',
    '/api/restorations/:id/parts',
    [201, 403, 403, 404, 401],
    () => ({ componentRef: 'C27', replacementRating: '22nF 630V' }),
  ],
  ['PATCH', '/api/parts/:partId', [200, 403, 403, 404, 401], () => ({ state: 'ordered' })],
  ['DELETE', '/api/parts/:partId', [204, 403, 403, 404, 401]],
  ['GET', '/api/restorations/:id/events', [200, 200, 200, 404, 401]],
  ['GET', '/api/activity', [200, 200, 200, 200, 401]],
  ['GET', '/api/restorations/:id/report.pdf', [200, 200, 200, 404, 401]],
  // The fixture restoration has an owner, so the technician's send succeeds.
  ['POST', '/api/restorations/:id/report/send', [200, 403, 403, 404, 401]],
  ['GET', '/api/restorations/:id/report/preview', [200, 403, 403, 404, 401]],
  ['GET', '/api/restorations/:id/safety-tests', [200, 200, 200, 404, 401]],
  [
    'POST',
    '/api/restorations/:id/safety-tests',
    [201, 403, 403, 404, 401],
    () => ({
      equipmentClass: 'class-1',
      earth: '0.08',
      insulation: '50M',
      fuseFitted: '1',
      fuseRecommended: '1',
      leadAndStrainRelief: true,
      coversRefitted: true,
      safetyClassCapacitors: true,
      specification: 'original',
    }),
  ],
  [
    'POST',
    '/api/restorations/:id/safety-override',
    [201, 403, 403, 404, 401],
    () => ({ reason: 'Owner collects it for display only, not for use.' }),
  ],
  ['GET', '/api/restorations/:id/soak-sessions', [200, 200, 200, 404, 401]],
  ['POST', '/api/restorations/:id/soak-sessions', [201, 403, 403, 404, 401]],
  // No soak session is running on the fixture, so the technician is told to start one.
  ['PATCH', '/api/restorations/:id/soak-sessions/running', [409, 403, 403, 404, 401], () => ({ mainsCurrent: '0.25' })],
  ['GET', '/api/restorations/:id/bringup', [200, 200, 200, 404, 401]],
  [
    'PUT',
    '/api/restorations/:id/bringup/intake',
    [200, 403, 403, 404, 401],
    () => ({ item: 'mains-lead', done: true }),
  ],
  [
    'PUT',
    '/api/restorations/:id/bringup/pre-power',
    [200, 403, 403, 404, 401],
    () => ({ item: 'mains-tap', status: 'done' }),
  ],
  // The fixture's pre-power checklist is empty, so the technician is told what is missing; mentors never sign off.
  ['POST', '/api/restorations/:id/bringup/pre-power/sign-off', [409, 403, 403, 404, 401]],
  // Not signed off either, so the technician's step meets the first-power gate.
  [
    'POST',
    '/api/restorations/:id/bringup/steps',
    [409, 403, 403, 404, 401],
    () => ({ supply: 'variable-transformer', appliedVolts: 60, lampBehaviour: 'no-lamp', decision: 'go-on' }),
  ],
  // The fixture's sheet page is not shared with the owner, and its R23 mark is on that page.
  ['GET', '/api/restorations/:id/sheets', [200, 200, 200, 404, 401]],
  ['POST', '/api/restorations/:id/sheets', [201, 403, 403, 404, 401], () => jpeg],
  ['GET', '/api/sheet-pages/:pageId', [200, 200, 404, 404, 401]],
  ['PATCH', '/api/sheet-pages/:pageId', [200, 403, 404, 404, 401], () => ({ title: 'Main chassis' })],
  ['DELETE', '/api/sheet-pages/:pageId', [204, 403, 404, 404, 401]],
  ['GET', '/api/restorations/:id/references', [200, 200, 200, 404, 401]],
  ['GET', '/api/restorations/:id/reference-marks', [200, 200, 200, 404, 401]],
  [
    'POST',
    '/api/restorations/:id/reference-marks',
    [201, 403, 403, 404, 401],
    (f) => ({ sheetPageId: f.pageId, ref: 'C14', shape: 'pin', points: [{ x: 0.3, y: 0.6 }] }),
  ],
  ['DELETE', '/api/reference-marks/:markId', [204, 403, 404, 404, 401]],
  // The fixture's mismatch note on R23 is not shared with the owner.
  ['GET', '/api/restorations/:id/mismatch-notes', [200, 200, 200, 404, 401]],
  [
    'POST',
    '/api/restorations/:id/mismatch-notes',
    [201, 403, 403, 404, 401],
    () => ({ ref: 'R23', kind: 'value-differs', diagramSays: '47k', chassisHas: '39k' }),
  ],
  ['PATCH', '/api/mismatch-notes/:noteId', [200, 403, 404, 404, 401], () => ({ ownerVisible: true })],
  ['DELETE', '/api/mismatch-notes/:noteId', [204, 403, 404, 404, 401]],
  // Help requests are the workshop's questions: mentors read them, owners never see them.
  [
    'POST',
    '/api/restorations/:id/help-requests',
    [201, 403, 403, 404, 401],
    () => ({ symptom: 'Hum with the volume at zero' }),
  ],
  ['GET', '/api/restorations/:id/help-requests', [200, 200, 403, 404, 401]],
  ['GET', '/api/help-requests', [200, 200, 200, 200, 401]],
  ['GET', '/api/help-requests/:helpRequestId', [200, 200, 403, 404, 401]],
  ['PATCH', '/api/help-requests/:helpRequestId', [200, 403, 403, 404, 401], () => ({ includeValves: false })],
  ['POST', '/api/help-requests/:helpRequestId/links', [201, 403, 403, 404, 401], () => ({})],
  ['DELETE', '/api/help-links/:helpToken', [204, 403, 403, 404, 401]],
  ['POST', '/api/help-replies/:replyId/approve', [200, 403, 403, 404, 401]],
  // The symptom checklist and requests for readings are the workshop's: mentors ask, the technician answers.
  ['GET', '/api/restorations/:id/symptom-checks', [200, 200, 403, 404, 401]],
  [
    'PUT',
    '/api/restorations/:id/symptom-checks/:symptomId/:causeId',
    [200, 403, 403, 404, 401],
    () => ({ result: 'ruled-out', note: 'Earth tags all below 0.2 Ω' }),
  ],
  ['GET', '/api/restorations/:id/reading-requests', [200, 200, 403, 404, 401]],
  [
    'POST',
    '/api/restorations/:id/reading-requests',
    [201, 201, 403, 404, 401],
    () => ({ kind: 'reading', body: 'Measure V3 pin 6 with no signal' }),
  ],
  ['GET', '/api/reading-requests', [200, 200, 200, 200, 401]],
  [
    'POST',
    '/api/reading-requests/:readingRequestId/answer',
    [200, 403, 403, 404, 401],
    () => ({ note: 'V3 pin 6 reads 95 V with no signal' }),
  ],
  // The link is the key: anyone holding it reads the request and may leave a reply, which is held.
  ['GET', '/api/shared/help/:helpToken', [200, 200, 200, 200, 200]],
  [
    'POST',
    '/api/shared/help/:helpToken/replies',
    [202, 202, 202, 202, 202],
    () => ({ name: 'Club member', body: 'Check the smoothing capacitors first.' }),
  ],
  // Money: mentors see none; the fixture has a sent version 1 and a draft version 2 of its estimate.
  ['GET', '/api/restorations/:id/money-settings', [200, 403, 403, 404, 401]],
  ['GET', '/api/restorations/:id/estimates', [200, 403, 200, 404, 401]],
  [
    'POST',
    '/api/restorations/:id/estimates',
    [201, 403, 403, 404, 401],
    () => ({ lines: [{ kind: 'labour', description: 'Recap and align', low: 120, high: 240 }] }),
  ],
  ['POST', '/api/estimates/:draftEstimateId/send', [200, 403, 403, 404, 401]],
  // The labour log is the technicians' own; no timer runs on a fresh fixture, so stopping one is a 409.
  ['GET', '/api/restorations/:id/labour', [200, 403, 403, 404, 401]],
  ['POST', '/api/restorations/:id/labour', [201, 403, 403, 404, 401], () => ({ minutes: 45, stage: 'repair' })],
  ['POST', '/api/restorations/:id/labour/timer', [201, 403, 403, 404, 401], () => ({ stage: 'repair' })],
  ['POST', '/api/restorations/:id/labour/timer/stop', [409, 403, 403, 404, 401]],
  // Invoices: the fixture has a £50 deposit request; nothing is billable yet, so a final invoice is a 409.
  ['GET', '/api/restorations/:id/invoices', [200, 403, 200, 404, 401]],
  ['POST', '/api/restorations/:id/deposits', [201, 403, 403, 404, 401], () => ({ amount: 5000 })],
  ['POST', '/api/restorations/:id/invoices', [409, 403, 403, 404, 401]],
  ['POST', '/api/invoices/:invoiceId/void', [200, 403, 403, 404, 401], () => ({ reason: 'Issued to the wrong set.' })],
  // Payments: a second deposit of the fixture has £10 paid in cash; the owner pays by card through the checkout (mentors see no money).
  ['GET', '/api/restorations/:id/payments', [200, 403, 200, 404, 401]],
  ['POST', '/api/invoices/:invoiceId/checkout', [200, 403, 200, 404, 401]],
  [
    'POST',
    '/api/invoices/:invoiceId/payments',
    [201, 403, 403, 404, 401],
    () => ({ amount: { amount: 1000, currency: 'GBP' }, method: 'transfer', receivedOn: '2026-12-01' }),
  ],
  ['POST', '/api/payments/:paymentId/refund', [201, 403, 403, 404, 401], () => ({})],
  // The payment service's events need no session, only a valid signature.
  [
    'POST',
    '/api/payments/webhook',
    [400, 400, 400, 400, 400],
    () => ({ id: 'evt_unsigned', type: 'checkout.session.completed' }),
  ],
  [
    'POST',
    '/api/estimates/:estimateId/decision',
    [403, 403, 200, 404, 401],
    () => ({ decision: 'approved', name: 'Ada Owner', version: 1 }),
  ],
  ['GET', '/api/restorations/:id/invoices/preview', [200, 403, 403, 404, 401]],
  ['GET', '/api/invoices/:invoiceId/invoice.pdf', [200, 403, 200, 404, 401]],
  // Nothing is paid against the fixture's deposit request, so there is no receipt yet.
  ['GET', '/api/invoices/:invoiceId/receipt.pdf', [409, 403, 409, 404, 401]],
  // Workshop-wide: judged on the person's roles across sets, so these rows use people who hold only the one role
  // (the table's own callers take in sets above and become technicians of those).
  ['GET', '/api/workshop/settings', [200, 403, 403, 403, 401], undefined, 'fresh people'],
  [
    'PUT',
    '/api/workshop/settings',
    [200, 403, 403, 403, 401],
    () => ({
      currency: 'GBP',
      labourRate: 4500,
      partsMarkupBasisPoints: 2000,
      taxName: 'VAT',
      taxRateBasisPoints: null,
      taxRounding: 'invoice-down',
      estimateApprovalRequired: false,
      invoicePrefix: '',
      timeZone: 'Europe/London',
    }),
    'fresh people',
  ],
  // The fresh technician is one of the workshop's administrators; an address with no account, and a person who is
  // not an administrator, are 404s (tests/api/workshop-admins.test.ts covers technicians who are not).
  ['GET', '/api/workshop/admins', [200, 403, 403, 403, 401], undefined, 'fresh people'],
  ['POST', '/api/workshop/admins', [404, 403, 403, 403, 401], () => ({ email: unique() }), 'fresh people'],
  ['DELETE', '/api/workshop/admins/:userId', [404, 403, 403, 403, 401], undefined, 'fresh people'],
];

let jpeg: Buffer;
const callers = ['technician', 'mentor', 'owner', 'nonMember', 'signedOut'] as const;
let t: Awaited<ReturnType<typeof startTestApp>>;
const people = {} as Record<(typeof callers)[number], { id: number; email: string; password: string } | undefined>;

beforeAll(async () => {
  const lax = { signInPerAccount: 1000, signInPerIp: 1000, resetPerAccount: 1000, resetPerIp: 1000, windowSeconds: 60 };
  t = await startTestApp({ throttle: lax });
  jpeg = await twoToneJpeg();
  for (const c of callers) people[c] = c === 'signedOut' ? undefined : await createUser(t.db);
});
afterAll(() => t.stop());

/** A fresh restoration per request, so deleting or demoting in one row cannot affect another. */
async function fixture(): Promise<Fixture> {
  const extra = await createUser(t.db);
  const r = await createRestoration(t.db, [
    { userId: people.technician!.id, role: 'technician' },
    { userId: people.mentor!.id, role: 'mentor' },
    { userId: people.owner!.id, role: 'owner' },
    { userId: extra.id, role: 'technician' },
  ]);
  const { invitation, token } = await invitationsRepo(t.db).issue(r.id, unique(), 'mentor', people.technician!.id);
  const storageKey = `${r.id}/${randomBytes(8).toString('hex')}`;
  await t.deps.storage.putObject(photoKeys(storageKey).original, jpeg, 'image/jpeg');
  const photoId = await photosRepo(t.db).insert({
    restorationId: r.id,
    storageKey,
    view: 'underside',
    phase: 'before',
    width: 600,
    height: 400,
    contentType: 'image/jpeg',
    sizeBytes: jpeg.length,
  });
  const findingId = await findingsRepo(t.db).insert({
    restorationId: r.id,
    photoId,
    shape: 'pin',
    points: [{ x: 0.5, y: 0.4 }],
    title: 'Leaky C27',
    kind: 'leaking',
    severity: 'fault',
    authorId: people.technician!.id,
  });
  const commentId = (await commentsRepo(t.db).insert({
    findingId,
    authorId: people.technician!.id,
    body: 'Smells burnt',
    internal: true,
  }))!;
  const measurementId = (
    await measurementsService(t.db).create(
      r.id,
      { location: 'R23', quantity: 'resistance', expected: '150', reading: '212' },
      people.technician!.id,
    )
  ).id;
  const partId = (
    await partsService(t.db).create(r.id, { componentRef: 'R23', action: 'replaced' }, people.technician!.id)
  ).id;
  const sheetId = await sheetsRepo(t.db).insertSheet({
    restorationId: r.id,
    storageKey: `${r.id}/${randomBytes(8).toString('hex')}`,
    contentType: 'image/png',
    sizeBytes: 1,
  });
  const pageId = await sheetsRepo(t.db).insertPage({
    sheetId,
    restorationId: r.id,
    pageNumber: 1,
    kind: 'circuit-diagram',
    width: 600,
    height: 400,
  });
  const markId = (
    await referencesRepo(t.db).insertMark({
      restorationId: r.id,
      sheetPageId: pageId,
      ref: 'R23',
      shape: 'pin',
      points: [{ x: 0.5, y: 0.5 }],
    })
  ).id;
  const noteId = (
    await mismatchesRepo(t.db).insert({ restorationId: r.id, ref: 'R23', kind: 'misprint', note: 'Printed as 4k7' })
  ).id;
  const help = helpRepo(t.db);
  const helpRequest = await help.insert({
    restorationId: r.id,
    symptom: 'Hum',
    authorId: people.technician!.id,
    partIds: [partId],
    measurementIds: [measurementId],
    photoIds: [photoId],
  });
  const link = newToken();
  const helpLink = await help.insertLink({
    helpRequestId: helpRequest.id,
    tokenHash: link.hash,
    expiresAt: new Date(Date.now() + 86_400_000),
    createdById: people.technician!.id,
  });
  const replyId = (
    await help.insertReply({
      helpRequestId: helpRequest.id,
      linkId: helpLink.id,
      name: 'Visitor',
      body: 'Try the rectifier',
    })
  ).id;
  const estimates = estimatesService(t.deps);
  const estimateId = (
    await estimates.create(
      r.id,
      { note: '', send: true, lines: [{ kind: 'part', description: 'Capacitors', low: 1000, high: 1500 }] },
      people.technician!.id,
      'technician',
    )
  ).id;
  const draftEstimateId = (
    await estimates.create(
      r.id,
      { note: '', send: false, lines: [{ kind: 'part', description: 'Capacitors', low: 1200, high: 1500 }] },
      people.technician!.id,
      'technician',
    )
  ).id;
  const invoiceId = (await invoicesService(t.deps).deposit(r.id, { amount: 5000 }, people.technician!.id)).id;
  const paidDepositId = (await invoicesService(t.deps).deposit(r.id, { amount: 3000 }, people.technician!.id)).id;
  const paymentId = (
    await paymentsService(t.deps).record(
      paidDepositId,
      { amount: { amount: 1000, currency: 'GBP' }, method: 'cash', receivedOn: '2026-12-01' },
      people.technician!.id,
      'technician',
    )
  ).id;
  const readingRequestId = (
    await t.db
      .insert(readingRequests)
      .values({
        restorationId: r.id,
        helpRequestId: helpRequest.id,
        kind: 'reading',
        body: 'Measure V3 pin 6',
        askedById: people.mentor!.id,
      })
      .returning({ id: readingRequests.id })
  )[0]!.id;
  return {
    id: r.id,
    userId: extra.id,
    invitationId: invitation.id,
    token,
    photoId,
    findingId,
    commentId,
    measurementId,
    partId,
    pageId,
    markId,
    noteId,
    helpRequestId: helpRequest.id,
    helpToken: link.token,
    replyId,
    estimateId,
    draftEstimateId,
    invoiceId,
    symptomId: 'hum',
    causeId: 'poor-earth',
    readingRequestId,
    paymentId,
  };
}

/** New people who each hold one role on one new set, and one who holds none. */
async function freshPeople() {
  const [technician, mentor, owner, nonMember] = await Promise.all([
    createUser(t.db, { workshopAdmin: true }),
    createUser(t.db),
    createUser(t.db),
    createUser(t.db),
  ]);
  await createRestoration(t.db, [
    { userId: technician.id, role: 'technician' },
    { userId: mentor.id, role: 'mentor' },
    { userId: owner.id, role: 'owner' },
  ]);
  const by = { technician, mentor, owner, nonMember, signedOut: undefined };
  return (c: (typeof callers)[number]) => (by[c] ? signedIn(t.app, by[c]) : anonymous(t.app));
}

async function callerAgent(c: (typeof callers)[number]): Promise<Agent> {
  const person = people[c];
  return person ? signedIn(t.app, person) : anonymous(t.app);
}

describe('authorisation matrix', () => {
  for (const [method, template, expected, body, fresh] of matrix)
    it(`${method} ${template} answers ${expected.join('/')} to ${callers.join('/')}`, async () => {
      const got: number[] = [];
      const only = fresh ? await freshPeople() : undefined;
      for (const c of callers) {
        const f = await fixture();
        const path = template.replace(/:(\w+)/g, (_, k: keyof Fixture) => String(f[k]));
        const agent = only ? await only(c) : await callerAgent(c);
        const req = agent[method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete'](path);
        const payload = body?.(f);
        got.push(
          (
            await (Buffer.isBuffer(payload)
              ? req.attach('file', payload, 'chassis.jpg')
              : payload
                ? req.send(payload)
                : req)
          ).status,
        );
      }
      expect(got).toEqual(expected);
    });

  it('lists every route the app registers', () => {
    const shape = (route: string) => route.replace(/:\w+/g, ':param');
    const inTable = matrix.map(([m, p]) => shape(`${m} ${p}`)).sort();
    expect(listApiRoutes(t.app).map(shape).sort()).toEqual(inTable);
  });
});

/*
 * Shared fixtures: the same routes seen by an owner on shared items, by a mentor on their own items and by a
 * second technician. Every internal text carries WORKSHOP-ONLY, and no owner response may contain it.
 */
const INTERNAL = 'WORKSHOP-ONLY';
type SharedFixture = Fixture & {
  internalFindingId: number;
  mentorFindingId: number;
  mentorCommentId: number;
  sharedCommentId: number;
};
type Caller = 'owner' | 'mentor' | 'secondTechnician';
type SharedRow = [Caller, Method, string, number, ((f: SharedFixture) => object)?];

const sharedMatrix: SharedRow[] = [
  ['owner', 'GET', '/api/restorations', 200],
  ['owner', 'GET', '/api/restorations/:id', 200],
  ['owner', 'GET', '/api/restorations/:id/members', 200],
  ['owner', 'GET', '/api/restorations/:id/photos', 200],
  ['owner', 'GET', '/api/photos/:photoId', 200],
  ['owner', 'PATCH', '/api/photos/:photoId', 403, () => ({ caption: 'Mine now' })],
  ['owner', 'DELETE', '/api/photos/:photoId', 403],
  ['owner', 'GET', '/api/photos/:photoId/findings', 200],
  [
    'owner',
    'POST',
    '/api/photos/:photoId/findings',
    403,
    () => ({ shape: 'pin', points: [{ x: 0.5, y: 0.5 }], title: 'Here?' }),
  ],
  ['owner', 'GET', '/api/restorations/:id/findings', 200],
  ['owner', 'GET', '/api/findings/:findingId', 200],
  ['owner', 'PATCH', '/api/findings/:findingId', 403, () => ({ status: 'repaired' })],
  ['owner', 'DELETE', '/api/findings/:findingId', 403],
  ['owner', 'GET', '/api/findings/:findingId/history', 200],
  ['owner', 'GET', '/api/findings/:findingId/closeup', 302],
  ['owner', 'GET', '/api/findings/:findingId/comments', 200],
  ['owner', 'POST', '/api/findings/:findingId/comments', 201, () => ({ body: 'Thank you' })],
  ['owner', 'PATCH', '/api/comments/:sharedCommentId', 403, () => ({ body: 'Changed' })],
  ['owner', 'DELETE', '/api/comments/:sharedCommentId', 403],
  ['owner', 'GET', '/api/findings/:internalFindingId', 404],
  ['owner', 'GET', '/api/findings/:internalFindingId/comments', 404],
  ['owner', 'GET', '/api/notifications', 200],
  ['owner', 'GET', '/api/questions', 200],
  ['owner', 'GET', '/api/restorations/:id/measurements', 200],
  ['owner', 'PATCH', '/api/measurements/:measurementId', 403, () => ({ reading: '151' })],
  ['owner', 'DELETE', '/api/measurements/:measurementId', 403],
  ['owner', 'GET', '/api/restorations/:id/valves', 200],
  ['owner', 'GET', '/api/restorations/:id/parts', 200],
  ['owner', 'GET', '/api/restorations/:id/parts.csv', 200],
  ['owner', 'PATCH', '/api/parts/:partId', 403, () => ({ state: 'ordered' })],
  ['owner', 'GET', '/api/restorations/:id/events', 200],
  ['owner', 'GET', '/api/activity', 200],
  ['owner', 'GET', '/api/restorations/:id/report.pdf', 200],
  // The help link's reader is judged like an owner: the same shared work, nothing internal.
  ['owner', 'GET', '/api/shared/help/:helpToken', 200],
  ['owner', 'GET', '/api/help-requests', 200],
  ['owner', 'GET', '/api/reading-requests', 200],
  ['mentor', 'PATCH', '/api/findings/:mentorFindingId', 200, () => ({ title: 'Check this joint again' })],
  ['mentor', 'PATCH', '/api/findings/:mentorFindingId', 403, () => ({ ownerVisible: true })],
  ['mentor', 'DELETE', '/api/findings/:mentorFindingId', 204],
  ['mentor', 'PATCH', '/api/comments/:mentorCommentId', 200, () => ({ body: 'Reflow it' })],
  ['mentor', 'DELETE', '/api/comments/:mentorCommentId', 204],
  ['mentor', 'DELETE', '/api/comments/:commentId', 403],
  ['mentor', 'PATCH', '/api/findings/:findingId', 403, () => ({ title: 'Not mine' })],
  ['secondTechnician', 'PATCH', '/api/findings/:findingId', 200, () => ({ status: 'suspected' })],
  ['secondTechnician', 'PATCH', '/api/findings/:mentorFindingId', 200, () => ({ ownerVisible: true })],
  ['secondTechnician', 'PATCH', '/api/comments/:commentId', 403, () => ({ body: 'Not my words' })],
  ['secondTechnician', 'DELETE', '/api/comments/:commentId', 204],
  ['secondTechnician', 'PATCH', '/api/parts/:partId', 200, () => ({ state: 'ordered' })],
  ['secondTechnician', 'PATCH', '/api/restorations/:id', 200, () => ({ stage: 'repair' })],
];

const binary = (res: NodeJS.ReadableStream, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => cb(null, Buffer.concat(chunks)));
};

let secondTechnician: Awaited<ReturnType<typeof createUser>>;
const sharedAgents = {} as Record<Caller, Agent>;

/** The fixture with its photo, finding, a comment and a reading shared, beside internal work marked WORKSHOP-ONLY. */
async function sharedFixture(): Promise<SharedFixture> {
  const f = await fixture();
  const { db } = t;
  await db.insert(memberships).values({ restorationId: f.id, userId: secondTechnician.id, role: 'technician' });
  const [photo] = await db.update(photos).set({ ownerVisible: true }).where(eq(photos.id, f.photoId)).returning();
  // The report draws the shared photo, so its served variant must exist.
  await t.deps.storage.putObject(photoKeys(photo!.storageKey).display, jpeg, 'image/jpeg');
  await db.update(findings).set({ ownerVisible: true }).where(eq(findings.id, f.findingId));
  await db
    .update(comments)
    .set({ body: `${INTERNAL}: quote was too low` })
    .where(eq(comments.id, f.commentId));
  await db.update(measurements).set({ ownerVisible: true }).where(eq(measurements.id, f.measurementId));
  await db
    .update(parts)
    .set({ state: 'fitted', notes: `${INTERNAL} note`, source: `${INTERNAL} supplier` })
    .where(eq(parts.id, f.partId));
  const sharedCommentId = (await commentsRepo(db).insert({
    findingId: f.findingId,
    authorId: people.technician!.id,
    body: 'Replaced R23 with a 2 W part.',
    internal: false,
  }))!;
  const repo = findingsRepo(db);
  const internalFindingId = await repo.insert({
    restorationId: f.id,
    photoId: f.photoId,
    shape: 'pin',
    points: [{ x: 0.2, y: 0.2 }],
    title: `${INTERNAL} cracked HT lead`,
    kind: 'cracked',
    severity: 'fault',
    authorId: people.technician!.id,
  });
  await commentsRepo(db).insert({
    findingId: internalFindingId,
    authorId: people.technician!.id,
    body: `${INTERNAL} shared words on an internal finding`,
    internal: false,
  });
  const mentorFindingId = await repo.insert({
    restorationId: f.id,
    photoId: f.photoId,
    shape: 'pin',
    points: [{ x: 0.7, y: 0.7 }],
    title: `${INTERNAL} check this joint`,
    kind: 'note',
    severity: 'info',
    authorId: people.mentor!.id,
  });
  const mentorCommentId = (await commentsRepo(db).insert({
    findingId: f.findingId,
    authorId: people.mentor!.id,
    body: `${INTERNAL} mentor aside`,
    internal: true,
  }))!;
  // Written while the finding was shared, before it was taken back: it must no longer reach the owner.
  await db.insert(notifications).values({
    userId: people.owner!.id,
    restorationId: f.id,
    findingId: internalFindingId,
    kind: 'reply',
    summary: `${INTERNAL} reply`,
  });
  await db
    .insert(events)
    .values({ restorationId: f.id, kind: 'question-asked', findingId: f.findingId, actorId: people.technician!.id });
  await db.insert(events).values({
    restorationId: f.id,
    kind: 'finding-opened',
    findingId: internalFindingId,
    photoId: f.photoId,
    actorId: people.technician!.id,
  });
  return { ...f, internalFindingId, mentorFindingId, mentorCommentId, sharedCommentId };
}

describe('authorisation on shared work, own items and a second technician', () => {
  beforeAll(async () => {
    secondTechnician = await createUser(t.db);
    sharedAgents.owner = await signedIn(t.app, people.owner!);
    sharedAgents.mentor = await signedIn(t.app, people.mentor!);
    sharedAgents.secondTechnician = await signedIn(t.app, secondTechnician);
  });

  for (const [caller, method, template, expected, body] of sharedMatrix)
    it(`${caller} ${method} ${template} answers ${expected}${caller === 'owner' && expected === 200 ? ' with nothing internal' : ''}`, async () => {
      const f = await sharedFixture();
      const path = template.replace(/:(\w+)/g, (_, k: keyof SharedFixture) => String(f[k]));
      const req = sharedAgents[caller][method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete'](path);
      const payload = body?.(f);
      const pdf = template.endsWith('.pdf');
      const sent = (payload ? req.send(payload) : req).buffer(true);
      const res = await (pdf ? sent.parse(binary as never) : sent);
      expect(res.status).toBe(expected);
      if (caller === 'owner' && res.status === 200) {
        const text = pdf ? await pdfText(res.body as Buffer) : res.text;
        expect(text.length).toBeGreaterThan(0);
        expect(text).not.toContain(INTERNAL);
        expect(text).not.toContain(`"findingId":${f.internalFindingId}`);
      }
    });

  it('when the owner lists the shared work, then the shared items are there (so the absence checks above are not vacuous)', async () => {
    const f = await sharedFixture();
    const owner = sharedAgents.owner;
    expect((await owner.get(`/api/restorations/${f.id}/photos`)).body.map((p: { id: number }) => p.id)).toEqual([
      f.photoId,
    ]);
    expect((await owner.get(`/api/restorations/${f.id}/findings`)).body.map((x: { id: number }) => x.id)).toEqual([
      f.findingId,
    ]);
    expect((await owner.get(`/api/findings/${f.findingId}/comments`)).body.map((c: { id: number }) => c.id)).toEqual([
      f.sharedCommentId,
    ]);
    expect((await owner.get(`/api/restorations/${f.id}/measurements`)).body.map((m: { id: number }) => m.id)).toEqual([
      f.measurementId,
    ]);
    expect((await owner.get(`/api/restorations/${f.id}/parts`)).body.map((p: { id: number }) => p.id)).toEqual([
      f.partId,
    ]);
    expect((await owner.get(`/api/findings/${f.findingId}`)).body.commentCount).toBe(1);
  });
});
