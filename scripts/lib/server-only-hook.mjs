// Resolve hook registered by server-only.mjs: `server-only` is an empty module outside Next.
export async function resolve(specifier, context, nextResolve) {
  if (specifier === 'server-only')
    return { url: new URL('./server-only-empty.mjs', import.meta.url).href, shortCircuit: true };
  return nextResolve(specifier, context);
}
