import { z } from 'zod';

/**
 * Runs in the browser before the app's own code. zod compiles fast parsers with `new Function` after
 * probing whether it may; under our Content-Security-Policy (no 'unsafe-eval', proxy.ts) the probe is
 * refused — harmlessly, but the browser reports a CSP violation for it. Parsing without the compiled
 * fast path is what a strict CSP allows anyway, so the probe is switched off.
 */
z.config({ jitless: true });
