import { afterEach, describe, expect, it } from 'vitest';
import { clientAddress, PEER_ADDRESS_HEADER, UNKNOWN_ADDRESS } from '@/lib/throttle/client-address';

/** Which address is believed, with and without trusted proxies (README "Throttling"; X-Forwarded-For as nginx appends it). */
afterEach(() => {
  delete process.env.NODEWRIGHT_TRUSTED_PROXY_HOPS;
});

describe('clientAddress', () => {
  it('uses the TCP peer and ignores a client-sent X-Forwarded-For by default', () => {
    expect(clientAddress({ [PEER_ADDRESS_HEADER]: '203.0.113.5', 'x-forwarded-for': '10.9.9.9' })).toBe('203.0.113.5');
    expect(
      clientAddress(new Headers({ [PEER_ADDRESS_HEADER]: '::ffff:127.0.0.1', 'x-forwarded-for': '1.2.3.4' })),
    ).toBe('127.0.0.1');
    expect(clientAddress({ 'x-forwarded-for': '1.2.3.4' })).toBe(UNKNOWN_ADDRESS);
  });

  it('behind N trusted proxies takes the N-th address from the right of X-Forwarded-For', () => {
    process.env.NODEWRIGHT_TRUSTED_PROXY_HOPS = '1';
    expect(
      clientAddress({ [PEER_ADDRESS_HEADER]: '10.0.0.2', 'x-forwarded-for': 'forged-by-client, 198.51.100.23' }),
    ).toBe('198.51.100.23');
    process.env.NODEWRIGHT_TRUSTED_PROXY_HOPS = '2';
    expect(
      clientAddress({ [PEER_ADDRESS_HEADER]: '10.0.0.2', 'x-forwarded-for': 'forged, 198.51.100.23, 10.0.0.7' }),
    ).toBe('198.51.100.23');
    // Fewer entries than trusted hops: the request did not come through the proxies; use the peer.
    expect(clientAddress({ [PEER_ADDRESS_HEADER]: '10.0.0.2', 'x-forwarded-for': '198.51.100.23' })).toBe('10.0.0.2');
  });

  it('refuses a setting that is not a small whole number', () => {
    process.env.NODEWRIGHT_TRUSTED_PROXY_HOPS = 'yes';
    expect(() => clientAddress({})).toThrow(/NODEWRIGHT_TRUSTED_PROXY_HOPS must be a whole number from 0 to 10/);
  });
});
