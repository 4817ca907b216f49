/**
 * Standard minutes of an operation from a time study, by the ILO work-study method (G. Kanawaty (ed.),
 * *Introduction to Work Study*, 4th ed., ILO, Geneva, 1992, the chapters on time study, rating and "from study
 * to standard time"; the steps below are from memory of that text, see ../shared/reference/production-and-costing.md §1.1):
 *
 * 1. each observed time is "extended" to a basic time at the moment it is taken: basic = observed × rating ÷ 100,
 *    on the British Standard 0–100 scale (100 = standard rating, a qualified worker working briskly);
 * 2. an element's selected basic time is the mean of its basic times (not the mean time × the mean rating);
 * 3. an element that does not occur every cycle (tie the bundle, read the ticket) counts at its frequency per
 *    garment, e.g. 0.1 for once per bundle of 10;
 * 4. standard time = basic time × (1 + relaxation % + contingency %), allowances as percentages of basic time.
 */

/** The British Standard (0–100) rating scale's standard pace. */
export const STANDARD_RATING = 100;

/** One timed cycle of an element: the observed minutes and the pace rated at that moment (BS 0–100 scale). */
export interface TimedObservation {
  /** Observed time, decimal minutes (> 0). */
  minutes: number;
  /** Rating on the BS 0–100 scale, e.g. 80 = slower than standard, 125 = very fast (> 0, at most 200). */
  rating: number;
}

/** One element of the operation (e.g. "pick up and align", "sew side seam", "aside"). */
export interface TimeStudyElement {
  name: string;
  observations: TimedObservation[];
  /** Occurrences per garment (default 1): 0.1 for once per bundle of 10. */
  frequency?: number;
}

/** Input to {@link studyStandardMinutes}. */
export interface TimeStudyInput {
  elements: TimeStudyElement[];
  /** Relaxation allowance, % of basic time (personal needs, basic fatigue and variable parts). */
  relaxationPercent: number;
  /** Contingency allowance, % of basic time (the ILO text says it should rarely exceed about 5 %). */
  contingencyPercent?: number;
}

/** One element's figures, in the order given. */
export interface StudiedElement {
  name: string;
  cycles: number;
  /** Mean observed minutes per occurrence. */
  meanObservedMinutes: number;
  /** Selected basic time per occurrence: mean of observed × rating ÷ 100. */
  basicMinutes: number;
  frequency: number;
  /** basicMinutes × frequency: this element's share of one garment's basic time. */
  basicMinutesPerGarment: number;
}

/** Result of {@link studyStandardMinutes}. Minutes are unrounded; show them to 0.001 min (common practice). */
export interface TimeStudyResult {
  elements: StudiedElement[];
  /** Basic minutes per garment: Σ element basic × frequency. */
  basicMinutes: number;
  /** Allowances as a fraction of basic time (relaxation + contingency). */
  allowanceFraction: number;
  /** Standard minutes per garment: basic × (1 + allowances). */
  standardMinutes: number;
}

const positiveFinite = (v: number) => Number.isFinite(v) && v > 0;

/**
 * Standard minutes per garment from a time-study sheet (see the module comment for the method). Throws RangeError
 * naming the element for an element without observations, a time or rating not above 0, a rating above 200, a
 * frequency not above 0, an allowance below 0 or above 100 %, or no elements at all.
 */
export function studyStandardMinutes(input: TimeStudyInput): TimeStudyResult {
  if (input.elements.length === 0) throw new RangeError('a time study needs at least one element');
  const relaxation = input.relaxationPercent;
  const contingency = input.contingencyPercent ?? 0;
  for (const [label, v] of [['relaxation', relaxation], ['contingency', contingency]] as const) {
    if (!Number.isFinite(v) || v < 0 || v > 100) throw new RangeError(`${label} allowance must be 0–100 %`);
  }
  const elements = input.elements.map((e): StudiedElement => {
    if (e.observations.length === 0) throw new RangeError(`element ${e.name}: no observations`);
    const frequency = e.frequency ?? 1;
    if (!positiveFinite(frequency)) throw new RangeError(`element ${e.name}: frequency must be above 0`);
    let observed = 0;
    let basic = 0;
    for (const o of e.observations) {
      if (!positiveFinite(o.minutes)) throw new RangeError(`element ${e.name}: observed time must be above 0`);
      if (!positiveFinite(o.rating) || o.rating > 200) throw new RangeError(`element ${e.name}: rating must be above 0 and at most 200`);
      observed += o.minutes;
      basic += (o.minutes * o.rating) / STANDARD_RATING;
    }
    const n = e.observations.length;
    const basicMinutes = basic / n;
    return { name: e.name, cycles: n, meanObservedMinutes: observed / n, basicMinutes, frequency, basicMinutesPerGarment: basicMinutes * frequency };
  });
  const basicMinutes = elements.reduce((a, e) => a + e.basicMinutesPerGarment, 0);
  const allowanceFraction = (relaxation + contingency) / 100;
  return { elements, basicMinutes, allowanceFraction, standardMinutes: basicMinutes * (1 + allowanceFraction) };
}
