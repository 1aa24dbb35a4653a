/**
 * Landed-cost engine: `landedCost(input)` and its types. Pure TypeScript: no framework, no
 * database, no Node-only APIs; decimal.js inside.
 */
export { landedCost } from './engine';
export { chooseAirBreak, type AirChoice } from './air-breaks';
export { allocateLargestRemainder, splitOverUnits } from './allocate';
export { bearer } from './bearer';
export { insurancePremium, type Premium } from './insurance';
export { STANDARD_CAUTIONS } from './cautions';
export * from './types';
