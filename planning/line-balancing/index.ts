export * from './line-balancing.types';
export { balanceLine } from './balance-line';
export { rankedPositionalWeights, balanceLineRpw } from './rpw-public';
