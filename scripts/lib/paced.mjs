// Evenly spaced requests with autocannon: `rate` requests a second, one every 1000/rate ms.
//
// Why not autocannon's own `overallRate`: it gives each connection its share of the rate and lets every
// connection send that share back to back at the start of each second, all connections on the same
// tick, so "20 requests a second" arrives as a burst of 20 at the top of each second and nothing for the
// rest of it (the "heartbeat" described in autocannon's issue tracker, mcollina/autocannon#174; the
// maintainer: not supported). A burst measures how long the server takes to drain a queue of 20 requests,
// not how it answers requests arriving at that rate. Here each request has a connection of its own, one
// request a second, and the connections are started 1000/rate ms apart, so their one-second ticks fall
// evenly through each second.
import autocannon from 'autocannon';

/** Percentile `q` (0–100) of sorted numbers, nearest rank. */
export function percentile(sorted, q) {
  if (!sorted.length) return 0;
  const rank = Math.ceil((q / 100) * sorted.length);
  return sorted[Math.min(sorted.length, Math.max(1, rank)) - 1];
}

/**
 * Runs `rate` requests a second to `url` for `duration` s, evenly spaced. Resolves with the figures
 * autocannon's result gives (requests, duration, latency p50/p99/max, status codes, bytes, errors).
 */
export async function paced({ url, headers = {}, rate, duration, timeout = 20 }) {
  const every = 1000 / rate;
  const conns = Math.max(1, Math.round(rate));
  const latencies = [];
  const codes = {};
  let bytes = 0;
  let errors = 0;
  let timeouts = 0;
  const runs = [];
  const started = performance.now();
  let lastAnswer = started;
  for (let i = 0; i < conns; i++) {
    const wait = started + i * every - performance.now();
    if (wait > 0) await new Promise((r) => setTimeout(r, wait));
    // Exactly `duration` requests a connection, one a second: rate × duration in all.
    const instance = autocannon({
      url,
      headers,
      connections: 1,
      connectionRate: 1,
      amount: Math.max(1, Math.round(duration)),
      timeout,
    });
    instance.on('response', (_client, statusCode, resBytes, responseTime) => {
      latencies.push(responseTime);
      lastAnswer = performance.now();
      codes[statusCode] = (codes[statusCode] ?? 0) + 1;
      bytes += resBytes;
    });
    runs.push(
      instance.then((r) => {
        errors += r.errors;
        timeouts += r.timeouts;
      }),
    );
  }
  await Promise.all(runs);
  // From the first request to the last answer, and the interval after it: `duration` seconds when the
  // server keeps up, longer (a lower rate) when answers come later than the next request was due. (Not
  // to the runs' end: a rate-limited autocannon connection notices it is done only at its next tick.)
  const seconds = (lastAnswer - started + every) / 1000;
  const sorted = latencies.sort((a, b) => a - b);
  const ms = (v) => Math.round(v);
  return {
    requests: sorted.length,
    seconds,
    rps: Math.round((sorted.length / seconds) * 10) / 10,
    p50: ms(percentile(sorted, 50)),
    p99: ms(percentile(sorted, 99)),
    max: ms(sorted.at(-1) ?? 0),
    codes,
    bytes: sorted.length ? Math.round(bytes / sorted.length) : 0,
    errors,
    timeouts,
  };
}

/** What the load scripts report of an autocannon run: requests, rate, median and p99 latency, codes. */
export function runFigures(r) {
  return {
    requests: r.requests.total,
    rps: Math.round((r.requests.total / r.duration) * 10) / 10,
    p50: r.latency.p50,
    p99: r.latency.p99,
    codes: Object.fromEntries(
      Object.entries(r.statusCodeStats ?? {}).map(([code, s]) => [code, Number(s.count)]),
    ),
  };
}

/**
 * The same figures for autocannon's own `overallRate` over `connections`: each second's requests sent
 * together at the second's start (the arrivals this bench used before, kept to compare).
 */
export async function bursts({ url, headers = {}, rate, duration, connections = 10, timeout = 20 }) {
  const r = await autocannon({ url, headers, connections, duration, timeout, overallRate: rate });
  const total = r.requests.total;
  return {
    ...runFigures(r),
    seconds: r.duration,
    max: r.latency.max,
    bytes: total ? Math.round(r.throughput.total / total) : 0,
    errors: r.errors,
    timeouts: r.timeouts,
  };
}
