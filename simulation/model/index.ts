export * from './schema';
export * from './techs';
export * from './parse';
export * from './migrations';
export * from './materials';
export * from './species';
export * from './resolve';
export * from './presets';
