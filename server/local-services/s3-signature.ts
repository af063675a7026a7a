import { createHash, createHmac, timingSafeEqual } from 'node:crypto';

/**
 * Checks an AWS Signature Version 4 (header or presigned URL) for the local S3 stand-in, which itself checks
 * only the key id. Follows AWS's "Signature Version 4 signing process" (canonical request → string to sign →
 * HMAC chain from the secret). The body is not hashed here: the declared payload hash is what is signed.
 */
export interface SignedRequest {
  method: string;
  /** The raw request target, e.g. `/bucket/photos%2Fa?list-type=2`, exactly as sent. */
  url: string;
  /** Lower-case header names. */
  headers: Record<string, string | string[] | undefined>;
}

const ALGORITHM = 'AWS4-HMAC-SHA256';
const sha256 = (text: string) => createHash('sha256').update(text).digest('hex');
const hmac = (key: Buffer | string, text: string) => createHmac('sha256', key).update(text).digest();
/** RFC 3986 unreserved characters stay; everything else is percent-encoded (AWS's UriEncode). */
const uriEncode = (text: string) =>
  encodeURIComponent(text).replace(/[!'()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);
const header = (req: SignedRequest, name: string) => {
  const value = req.headers[name];
  return (Array.isArray(value) ? value.join(',') : (value ?? '')).trim().replace(/\s+/g, ' ');
};

interface Parsed {
  keyId: string;
  scope: string;
  date: string;
  amzDate: string;
  signedHeaders: string[];
  signature: string;
  payloadHash: string;
  query: [string, string][];
}

function parse(req: SignedRequest): Parsed | undefined {
  const [, rawQuery = ''] = req.url.split(/\?(.*)/s);
  const query = [...new URLSearchParams(rawQuery)] as [string, string][];
  const q = new Map(query);
  const auth = header(req, 'authorization');
  if (auth.startsWith(`${ALGORITHM} `)) {
    const fields = Object.fromEntries(
      auth
        .slice(ALGORITHM.length + 1)
        .split(/,\s*/)
        .map((f) => f.split('=') as [string, string]),
    );
    const [keyId, ...scope] = (fields.Credential ?? '').split('/');
    if (!keyId || scope.length !== 4 || !fields.SignedHeaders || !fields.Signature) return undefined;
    return {
      keyId,
      scope: scope.join('/'),
      date: scope[0]!,
      amzDate: header(req, 'x-amz-date'),
      signedHeaders: fields.SignedHeaders.split(';'),
      signature: fields.Signature,
      payloadHash: header(req, 'x-amz-content-sha256') || 'UNSIGNED-PAYLOAD',
      query,
    };
  }
  if (q.get('X-Amz-Algorithm') === ALGORITHM) {
    const [keyId, ...scope] = (q.get('X-Amz-Credential') ?? '').split('/');
    if (!keyId || scope.length !== 4) return undefined;
    return {
      keyId,
      scope: scope.join('/'),
      date: scope[0]!,
      amzDate: q.get('X-Amz-Date') ?? '',
      signedHeaders: (q.get('X-Amz-SignedHeaders') ?? 'host').split(';'),
      signature: q.get('X-Amz-Signature') ?? '',
      payloadHash: 'UNSIGNED-PAYLOAD',
      query: query.filter(([k]) => k !== 'X-Amz-Signature'),
    };
  }
  return undefined;
}

export const isPresigned = (req: SignedRequest) =>
  !header(req, 'authorization') && new URLSearchParams(req.url.split('?')[1] ?? '').has('X-Amz-Signature');

/** True when the request is signed with this key pair and the signature matches. */
export function verifySignature(req: SignedRequest, keyId: string, secret: string): boolean {
  const p = parse(req);
  if (!p || p.keyId !== keyId || !/^[0-9a-f]{64}$/.test(p.signature)) return false;
  const path = req.url.split('?')[0] || '/';
  const query = p.query
    .map(([k, v]) => [uriEncode(k), uriEncode(v)] as const)
    .sort(([a, av], [b, bv]) => (a === b ? (av < bv ? -1 : 1) : a < b ? -1 : 1))
    .map(([k, v]) => `${k}=${v}`)
    .join('&');
  const headers = p.signedHeaders.map((h) => `${h}:${header(req, h)}\n`).join('');
  const canonical = [req.method, path, query, headers, p.signedHeaders.join(';'), p.payloadHash].join('\n');
  const toSign = [ALGORITHM, p.amzDate, p.scope, sha256(canonical)].join('\n');
  const [date, region, service, terminator] = p.scope.split('/') as [string, string, string, string];
  const key = hmac(hmac(hmac(hmac(`AWS4${secret}`, date), region), service), terminator);
  const expected = hmac(key, toSign);
  return timingSafeEqual(expected, Buffer.from(p.signature, 'hex'));
}
