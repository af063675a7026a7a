import Stripe from 'stripe';

/** How to reach the hosted payment service: the real one (key only), or the local fake (`api` points the SDK at it). */
export interface PaymentServiceConfig {
  secretKey: string;
  webhookSecret: string;
  api?: { host: string; port: number; protocol: 'http' | 'https' };
}

/** The official SDK, and the secret that signs the events sent to /api/payments/webhook. */
export interface PaymentService {
  sdk: Stripe;
  webhookSecret: string;
}

export function createPaymentService(config: PaymentServiceConfig): PaymentService {
  const sdk = new Stripe(config.secretKey, { ...config.api, maxNetworkRetries: 2, timeout: 20_000, telemetry: false });
  return { sdk, webhookSecret: config.webhookSecret };
}
