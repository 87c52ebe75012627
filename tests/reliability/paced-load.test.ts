import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bursts, paced, percentile } from '../../scripts/lib/paced.mjs';

// The scale bench's load: requests evenly spaced at the rate asked, where autocannon's own overallRate
// sends each second's share of every connection together at the top of the second. Checked by when the
// requests reach a local server (gaps between arrivals), not by how fast anything is.
let server: http.Server;
let url: string;
let arrivals: number[] = [];

beforeAll(async () => {
  server = http.createServer((req, res) => {
    arrivals.push(performance.now());
    res.end('ok');
  });
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}/`;
});

afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

/** How long the first `n` requests took to arrive, first to last, in ms. */
const spanOf = (n: number) => arrivals[n - 1]! - arrivals[0]!;

/** Gaps between consecutive arrivals of the first `n` requests, in ms, sorted. */
const firstGaps = (n: number) =>
  arrivals
    .slice(0, n)
    .slice(1)
    .map((t, i) => t - arrivals[i]!)
    .sort((a, b) => a - b);

describe('evenly spaced requests', () => {
  it('nearest-rank percentiles', () => {
    const sorted = Array.from({ length: 200 }, (_, i) => i + 1);
    expect(percentile(sorted, 50)).toBe(100);
    expect(percentile(sorted, 99)).toBe(198);
    expect(percentile([7], 99)).toBe(7);
    expect(percentile([], 50)).toBe(0);
  });

  it('spreads a second’s requests through the second, unlike a burst', { timeout: 30_000 }, async () => {
    arrivals = [];
    const even = await paced({ url, rate: 10, duration: 2 });
    expect(even.codes).toEqual({ 200: even.requests });
    expect(even.requests).toBe(20);
    // Two seconds of requests, whatever the runs take to notice they are done.
    expect(even.seconds).toBeLessThan(2.9);
    // 10 a second: one every 100 ms, so the first ten arrive over about 900 ms. A busy machine fires some
    // timers late and then several together (gaps of a few ms beside gaps of 200), so the check is on
    // the ten's spread, which lateness shortens only by as much as the first one is late.
    expect(spanOf(10)).toBeGreaterThanOrEqual(450);

    arrivals = [];
    await bursts({ url, connections: 10, rate: 10, duration: 1 });
    // The burst it replaces: the first second's ten requests all within a few milliseconds.
    expect(percentile(firstGaps(10), 50)).toBeLessThan(50);
    expect(spanOf(10)).toBeLessThan(450);
  });
});
