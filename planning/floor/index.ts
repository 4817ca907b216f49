export { operatorEfficiency, earnedMinutes, lineEfficiency } from './efficiency';
export { computePiecePay } from './piece-pay';
export type { WorkRecord, PiecePayInput, PersonPay, PiecePay } from './piece-pay';
