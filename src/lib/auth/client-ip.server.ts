/**
 * The client's IP address for rate limits. Only when TRUST_PROXY is a number N ≥ 1 (that many proxies of ours
 * in front) is X-Forwarded-For read, and then its N-th address from the right — never the leftmost one, which
 * the client writes itself. Otherwise the socket's address; but Astro 5's node adapter reports the leftmost
 * X-Forwarded-For entry as clientAddress when the header is present (astro/dist/core/app/node.js), so a
 * request that carries the header without a trusted proxy is counted in one shared bucket: rotating forged
 * addresses then buys no fresh limits.
 */
import type { APIContext } from 'astro';

/** The bucket of requests that name a forwarded address no trusted proxy vouches for. */
export const UNTRUSTED_FORWARDED = 'untrusted-forwarded';

/** The address to count attempts against; "unknown" when the adapter cannot tell. */
export function clientIp(context: Pick<APIContext, 'clientAddress' | 'request'>): string {
  const hops = Number(process.env.TRUST_PROXY ?? 0);
  if (Number.isInteger(hops) && hops >= 1) {
    const chain = (context.request.headers.get('x-forwarded-for') ?? '')
      .split(',')
      .map((part) => part.trim())
      .filter(Boolean);
    const candidate = chain[chain.length - hops];
    if (candidate) return candidate;
  } else if (context.request.headers.has('x-forwarded-for')) {
    return UNTRUSTED_FORWARDED;
  }
  try {
    return context.clientAddress || 'unknown';
  } catch {
    return 'unknown';
  }
}
