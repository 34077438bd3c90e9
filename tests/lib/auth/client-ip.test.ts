import { afterEach, describe, expect, it } from 'vitest';
import { clientIp } from '../../../src/lib/auth/client-ip.server';

const ctx = (xff?: string) => ({
  clientAddress: '10.0.0.5',
  request: new Request('http://x/', { headers: xff ? { 'x-forwarded-for': xff } : {} }),
});

afterEach(() => {
  delete process.env.TRUST_PROXY;
});

describe('clientIp', () => {
  it('uses the socket address without TRUST_PROXY, whatever X-Forwarded-For says', () => {
    expect(clientIp(ctx())).toBe('10.0.0.5');
    expect(clientIp(ctx('203.0.113.9'))).toBe('10.0.0.5');
    process.env.TRUST_PROXY = 'yes';
    expect(clientIp(ctx('198.51.100.7'))).toBe('10.0.0.5');
  });

  it('takes the address added by our own proxies, counting TRUST_PROXY hops from the right', () => {
    process.env.TRUST_PROXY = '1';
    expect(clientIp(ctx('198.51.100.1, 203.0.113.9'))).toBe('203.0.113.9');
    process.env.TRUST_PROXY = '2';
    expect(clientIp(ctx('198.51.100.1, 203.0.113.9, 10.1.1.1'))).toBe('203.0.113.9');
    expect(clientIp(ctx())).toBe('10.0.0.5');
  });
});
