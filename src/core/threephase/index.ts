/**
 * Three-phase analysis: pure math on phasors, radians inside, no host code.
 * Conventions: positive sequence 1→2→3 (phase 2 at −120°, phase 3 at +120°),
 * a = 1∠120°, symmetrical components referred to phase 1, S = V·I*.
 */
export * from './types';
export * from './sets';
export * from './loads';
export * from './star';
export * from './delta';
export * from './linear';
export * from './neutral';
export * from './sequences';
export * from './unbalance';
export * from './schedule';
export * from './drop';
export * from './losses';
