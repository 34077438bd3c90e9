/**
 * The client's IP address for rate limits. Only when TRUST_PROXY is a number N ≥ 1 (that many proxies of ours
 * in front) is X-Forwarded-For read, and then its N-th address from the right — never the leftmost one, which
 * the client writes itself. Otherwise the socket's address: the server entry (src/server/serve.ts) drops an
 * X-Forwarded-For header before Astro reads it, since Astro's node adapter would report the header's leftmost
 * entry as clientAddress (astro/dist/core/app/node.js), and a forged header must not move a caller into a
 * bucket of its own.
 */
import type { RequestContext } from '../http/request-context';
import { serverConfig } from '../server-config';

/** How many proxies of ours stand in front (TRUST_PROXY); 0 when unset or not a whole number ≥ 1. */
export function trustedProxyHops(): number {
  return serverConfig('TRUST_PROXY');
}

/** The address to count attempts against; "unknown" when the adapter cannot tell. */
export function clientIp(context: Pick<RequestContext, 'clientAddress' | 'request'>): string {
  const hops = trustedProxyHops();
  if (hops >= 1) {
    const chain = (context.request.headers.get('x-forwarded-for') ?? '')
      .split(',')
      .map((part) => part.trim())
      .filter(Boolean);
    const candidate = chain[chain.length - hops];
    if (candidate) return candidate;
  }
  try {
    return context.clientAddress || 'unknown';
  } catch {
    return 'unknown';
  }
}
