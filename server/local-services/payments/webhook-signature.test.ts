import Stripe from 'stripe';
import { describe, expect, it } from 'vitest';
import { signatureHeader } from './webhook-signature';

// The format is the payment service's published webhook signing scheme (Stripe docs, "Verify webhook signatures
// manually": t=<timestamp>,v1=<HMAC-SHA256 of "t.payload">); the judge here is the official SDK's own check.
const sdk = new Stripe('sk_test_unit', { telemetry: false });
const secret = 'whsec_unit_test_secret';
const payload = JSON.stringify({
  id: 'evt_test_1',
  object: 'event',
  type: 'checkout.session.completed',
  data: { object: { id: 'cs_test_1' } },
});

describe('the payment fake signs events as the service does', () => {
  it('when the SDK checks an event signed by the fake, then it verifies and returns the event', () => {
    const event = sdk.webhooks.constructEvent(payload, signatureHeader(payload, secret), secret);
    expect(event.id).toBe('evt_test_1');
  });

  it("when the header is compared with the SDK's own test header for the same instant, then they are identical", () => {
    const at = new Date('2026-12-02T10:00:00Z');
    const expected = sdk.webhooks.generateTestHeaderString({ payload, secret, timestamp: at.getTime() / 1000 });
    expect(signatureHeader(payload, secret, at)).toBe(expected);
  });

  it('when the payload, the secret or the age is wrong, then the SDK refuses it', () => {
    const header = signatureHeader(payload, secret);
    expect(() => sdk.webhooks.constructEvent(`${payload} `, header, secret)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    expect(() => sdk.webhooks.constructEvent(payload, header, 'whsec_another')).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
    // The SDK's default tolerance is 300 seconds.
    const old = signatureHeader(payload, secret, new Date(Date.now() - 600_000));
    expect(() => sdk.webhooks.constructEvent(payload, old, secret)).toThrow(
      Stripe.errors.StripeSignatureVerificationError,
    );
  });
});
