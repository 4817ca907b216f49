export { operatorEfficiency, earnedMinutes, lineEfficiency, efficiencyPercent, EFFICIENCY_DEFINITION } from './efficiency';
export { computePiecePay } from './piece-pay';
export type { WorkRecord, PiecePayInput, PersonPay, PiecePay } from './piece-pay';
