/**
 * The client's IP address for rate limits. By default the socket's address (Astro's clientAddress); only when
 * TRUST_PROXY is a number N ≥ 1 (that many proxies of ours in front) the N-th address from the right of
 * X-Forwarded-For — never the leftmost one, which the client writes itself.
 */
import type { APIContext } from 'astro';

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
  }
  try {
    return context.clientAddress || 'unknown';
  } catch {
    return 'unknown';
  }
}
