export { rateMillionths, formatRate, roundHalfUp, exactRateOf, operationRate, RATE_DECIMALS, RATE_SCALE } from './exact-rate';
export { computePeriodPay } from './period-pay';
export type { PayWork, PayAttendance, PayRules, PeriodPayInput, PiecePayLine, PersonPeriodPay } from './period-pay';
