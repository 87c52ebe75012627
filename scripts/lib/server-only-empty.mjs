// An empty module: what `server-only` is outside Next (vitest.config.ts and server-only-hook.mjs).
