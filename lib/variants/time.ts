/**
 * DATETIME columns keep whole seconds. Stamping whole seconds ourselves makes what an API call answers
 * match what a later read of the same row returns.
 */
export const wholeSecond = (d: Date = new Date()): Date => new Date(Math.floor(d.getTime() / 1000) * 1000);
