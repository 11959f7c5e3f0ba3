export * from './errors';
export * from './phasor';
export * from './parse';
export * from './format';
export * from './combine';
