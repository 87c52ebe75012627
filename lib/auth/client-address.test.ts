import http from 'node:http';
import { afterAll, describe, expect, it } from 'vitest';
import { installPeerAddressStamp, PEER_HEADER, uninstallPeerAddressStamp } from '@/lib/security/peer-address';
import { clientAddress, trustedProxyHops } from './client-address';

describe('clientAddress', () => {
  const forwarded = { 'x-forwarded-for': '6.6.6.6, 203.0.113.9, 10.0.0.2', 'x-real-ip': '7.7.7.7' };

  it('never reads forwarded headers without a trusted proxy: anyone can write them', () => {
    expect(clientAddress(forwarded, 0)).toBe('unknown');
    expect(clientAddress(new Headers(forwarded), 0)).toBe('unknown');
  });

  it('behind N trusted proxies takes the entry N places from the right, never what the client wrote', () => {
    expect(clientAddress(forwarded, 1)).toBe('10.0.0.2');
    expect(clientAddress(forwarded, 2)).toBe('203.0.113.9');
    expect(clientAddress(new Headers(forwarded), 2)).toBe('203.0.113.9');
  });

  it('reads TRUST_PROXY as a number of hops; anything else trusts nothing', () => {
    expect(trustedProxyHops(undefined)).toBe(0);
    expect(trustedProxyHops('')).toBe(0);
    expect(trustedProxyHops('true')).toBe(1);
    expect(trustedProxyHops('2')).toBe(2);
    expect(trustedProxyHops('yes')).toBe(0);
    expect(trustedProxyHops('-1')).toBe(0);
  });
});

describe('the connection address stamp', () => {
  const servers: http.Server[] = [];
  afterAll(async () => {
    await Promise.all(servers.map((s) => new Promise((r) => s.close(r))));
    uninstallPeerAddressStamp();
  });

  it('gives route code the real peer address and ignores a header of the same name sent by the client', async () => {
    installPeerAddressStamp();
    const seen: string[] = [];
    const headersSeen: Headers[] = [];
    const server = http.createServer((req, res) => {
      const headers = new Headers(req.headers as Record<string, string>);
      headersSeen.push(headers);
      seen.push(clientAddress(headers, 0));
      res.end('ok');
    });
    servers.push(server);
    await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
    const { port } = server.address() as { port: number };
    const res = await fetch(`http://127.0.0.1:${port}/`, {
      headers: { [PEER_HEADER]: 'guessed 6.6.6.6', 'x-forwarded-for': '6.6.6.6' },
    });
    expect(await res.text()).toBe('ok');
    expect(seen[0]).toBe('127.0.0.1');
    // A header made elsewhere (no secret) gives no address.
    expect(clientAddress({ [PEER_HEADER]: 'guessed 6.6.6.6' }, 0)).toBe('unknown');
    uninstallPeerAddressStamp();
    expect(clientAddress(headersSeen[0]!, 0)).toBe('unknown');
  });
});
