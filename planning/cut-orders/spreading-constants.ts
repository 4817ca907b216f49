import { mm, type Millimetres } from '@shared/units';

/**
 * Safety (end) allowance at EACH end of a spread of non-elastic fabric: 1 cm.
 * Source: Vilumsone-Nemes, *Industrial Cutting of Textile Materials*, §4.2.3, p. 31 [quoted].
 */
export const END_ALLOWANCE_EACH_END_NON_ELASTIC_MM: Millimetres = mm(10);
/** Elastic fabrics: 1.5–2.0 cm at each end; the upper value is kept (same source, p. 31). */
export const END_ALLOWANCE_EACH_END_ELASTIC_MM: Millimetres = mm(20);
/** First ply on underlay paper: up to 3 cm at each end (same source, p. 31). */
export const END_ALLOWANCE_EACH_END_FIRST_PLY_MM: Millimetres = mm(30);

/**
 * Default end allowance per ply (both ends together): 2 × 1 cm for non-elastic fabric, 20 mm.
 * Vilumsone-Nemes, §4.2.3, p. 31.
 */
export const DEFAULT_END_ALLOWANCE_PER_PLY_MM: Millimetres = mm(2 * END_ALLOWANCE_EACH_END_NON_ELASTIC_MM);

/** Splice (overlap) zone, "optimal" width 10–20 cm; 150 mm is the middle of it (Vilumsone-Nemes, p. 41). */
export const DEFAULT_SPLICE_OVERLAP_MM: Millimetres = mm(150);

/**
 * Roll ends shorter than this are not spliced into a ply: too short to handle at the table, they go to
 * remnants. 0.5 m is common practice (no published figure).
 */
export const DEFAULT_MIN_SPLICE_TAIL_MM: Millimetres = mm(500);

/**
 * Roll ends at or above this length are kept as stock (remnants), shorter ones are waste.
 * 1 m is common practice (no published figure).
 */
export const DEFAULT_REMNANT_STOCK_THRESHOLD_MM: Millimetres = mm(1000);

/**
 * Cutting-room minutes one lay costs whatever its height: laying the marker, setting up the spread,
 * cutting round the pieces and bundling off. 30 minutes is common practice for a small studio's hand
 * spread (no published figure); priced at the style's labour cost per minute when no lay cost is set.
 */
export const DEFAULT_LAY_MINUTES = 30;

/** Minutes of spreading per ply by hand, two people walking the roll: 0.5, common practice (no published figure). */
export const DEFAULT_PLY_MINUTES = 0.5;
