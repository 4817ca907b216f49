export * from './costing.types';
export { costGarment, COSTING_ROUNDING_RULE } from './cost-garment';
export { roundMinor } from './round-minor';
export * from './pricing';
