import { randomBytes } from 'node:crypto';
import { signatureHeader } from './webhook-signature';

/** What the fake sent: the exact body and signature header, so a test can deliver it again. */
export interface SentEvent {
  id: string;
  type: string;
  payload: string;
  header: string;
  /** The app's answer (0 when it could not be reached). */
  status: number;
}

export const fakeId = (prefix: string) => `${prefix}_test_${randomBytes(12).toString('hex')}`;

/**
 * Signs and posts events to the app's webhook endpoint one after another, in the order they happened, retrying a
 * failed delivery a few times (the real service retries for days). `settled()` resolves once the queue is empty.
 */
export function webhookSender(secret: string, apiVersion: string) {
  let url: string | undefined;
  let queue = Promise.resolve();
  const sent: SentEvent[] = [];

  async function post(payload: string, header: string): Promise<number> {
    if (!url) return 0;
    try {
      const res = await fetch(url, {
        method: 'POST',
        headers: { 'content-type': 'application/json; charset=utf-8', 'stripe-signature': header },
        body: payload,
      });
      await res.arrayBuffer();
      return res.status;
    } catch {
      return 0;
    }
  }

  async function deliver(type: string, object: object) {
    const event = {
      id: fakeId('evt'),
      object: 'event',
      api_version: apiVersion,
      created: Math.floor(Date.now() / 1000),
      type,
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      data: { object },
    };
    const payload = JSON.stringify(event, null, 2);
    let status = 0;
    for (let attempt = 0; attempt < 5; attempt++) {
      status = await post(payload, signatureHeader(payload, secret));
      if (status >= 200 && status < 300) break;
      await new Promise((r) => setTimeout(r, 150 * (attempt + 1)));
    }
    sent.push({ id: event.id, type, payload, header: signatureHeader(payload, secret), status });
  }

  return {
    sent,
    setUrl: (next: string | undefined) => void (url = next),
    /** Queues an event; its data is a copy taken now, as the service snapshots the object when the event happens. */
    emit(type: string, object: object) {
      const snapshot = structuredClone(object);
      queue = queue.then(() => deliver(type, snapshot));
    },
    settled: () => queue,
    /** Posts a body with a header as given (a replay, or a forged signature in a test). */
    post,
  };
}
