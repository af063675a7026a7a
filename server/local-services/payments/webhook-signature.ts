import { createHmac } from 'node:crypto';

/**
 * The `Stripe-Signature` header as the payment service writes it: `t=<unix seconds>,v1=<hex HMAC-SHA256 of
 * "<t>.<payload>" keyed with the endpoint's signing secret>`. The SDK's `webhooks.constructEvent` checks exactly this.
 */
export function signatureHeader(payload: string, secret: string, at: Date = new Date()): string {
  const t = Math.floor(at.getTime() / 1000);
  const v1 = createHmac('sha256', secret).update(`${t}.${payload}`, 'utf8').digest('hex');
  return `t=${t},v1=${v1}`;
}
