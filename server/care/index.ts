// The care engine's public surface: callers import from here, never from the files themselves.
export * from './errors';
export * from './dates';
export * from './degree-days';
export * from './chill';
export * from './daylight';
export * from './ladder';
export * from './cautions';
export * from './sources';
export * from './catalogue';
export * from './projection';
export * from './windows';
export * from './stone-fruit-check';
