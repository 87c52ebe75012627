/** Public API of the light-and-heat engine (pure TypeScript; see simulation/README.md). */
export * from './model';
