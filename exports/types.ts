/**
 * Inputs of the document builders in `exports/xlsx` and `exports/pdf`.
 *
 * Plain data only: the server maps its entities and the cores' results to these shapes. Money is integer
 * minor units of one ISO 4217 currency per document; lengths are millimetres and are shown in the studio's
 * unit system; dates arrive as ISO 8601 strings (builders never read the clock).
 */
import type { Millimetres, MinorUnits } from '@shared/units';
import type { Language } from '@shared/format/studio-format';

/** How lengths are shown: metres/centimetres, or yards/inches. */
export type UnitSystem = 'metric' | 'imperial';

/** What every document carries in its heading. */
export interface DocumentHeading {
  /** The studio's name, printed on every document. */
  studioName: string;
  /** Issue date, ISO 8601 (`2026-03-14` or a full timestamp; only the calendar date in UTC is shown). */
  dateIso: string;
  /** BCP 47 locale for dates and numbers, e.g. `en-GB`. */
  locale: string;
  /** Language of the document's words (default English). */
  language?: Language;
  /** IANA time zone in which dates are shown (default UTC). */
  timeZone?: string;
}

/** Heading of a document that shows money. */
export interface MoneyDocumentHeading extends DocumentHeading {
  /** ISO 4217 code, e.g. `EUR`; its minor-unit digits come from `Intl` (JPY 0, EUR 2). */
  currency: string;
}

/** One size of a batch and how many garments of it are made. */
export interface SizeQuantity {
  size: string;
  quantity: number;
}

// ---------------------------------------------------------------- costing sheet

/** A fabric line: consumption per garment for each size × price per metre (metric) or per yard (imperial). */
export interface CostingFabricLine {
  description: string;
  /** Price per metre when the unit system is metric, per yard when imperial. */
  pricePerLengthMinor: MinorUnits;
  /** Consumption per garment by size label; a size missing here consumes none of this fabric. */
  consumptionMmBySize: Record<string, Millimetres>;
}

/** A trims / notions line (bill of materials): quantity per garment × unit price. */
export interface CostingTrimLine {
  description: string;
  /** Quantity per garment; a number per size label, or one number for every size. */
  quantityPerGarment: number | Record<string, number>;
  /** Unit name shown beside the quantity, e.g. `pcs`, `m`. */
  unit: string;
  unitPriceMinor: MinorUnits;
}

/** Rate of a labour line: an exact decimal cost per minute (major units, e.g. `'0.4006'`) or a rate per hour. */
/** Per minute (a decimal string in major units), per hour (minor units), or a piece rate per garment (minor units; minutes unused). */
export type LabourRate = { perMinute: string } | { perHourMinor: MinorUnits } | { perGarmentMinor: MinorUnits };

/** A labour line: standard minutes (SAM) per garment × cost per minute. */
export interface CostingLabourLine {
  operation: string;
  /** Standard allowed minutes per garment; one number or a number per size label. */
  samMinutes: number | Record<string, number>;
  rate: LabourRate;
}

/**
 * An overhead line: a fixed amount per garment, or a percentage of the running cost above it (so a later
 * percentage applies to earlier overheads too, as in the Texas Education Agency costing key).
 */
export type CostingOverheadLine =
  | { kind: 'per-garment'; description: string; amountMinor: MinorUnits }
  | { kind: 'percent'; description: string; percent: number };

/** Everything the costing sheet needs; the sheet computes the rest with live formulas. */
export interface CostingSheetInput extends MoneyDocumentHeading {
  unitSystem: UnitSystem;
  style: { code: string; name: string };
  batch: { code: string };
  sizes: SizeQuantity[];
  fabrics: CostingFabricLine[];
  trims: CostingTrimLine[];
  labour: CostingLabourLine[];
  overheads: CostingOverheadLine[];
  /** Margin on the wholesale price, percent: wholesale = cost / (1 − margin). 0 sells at cost. */
  marginPercent: number;
  /** Retail = wholesale × multiplier; keystone (2) when omitted. */
  retailMultiplier?: number;
}

// ---------------------------------------------------------------- purchase order

/** Quantity of a purchase-order line: a length (shown in m or yd) or a count of some unit. */
export type PurchaseOrderQuantity =
  { kind: 'length'; lengthMm: Millimetres } | { kind: 'count'; count: number; unit: string };

/** One ordered item; a length line's unit price is per metre (metric) or per yard (imperial). */
export interface PurchaseOrderLine {
  item: string;
  description: string;
  quantity: PurchaseOrderQuantity;
  unitPriceMinor: MinorUnits;
}

/** A fabric and trims purchase order to one supplier. */
export interface PurchaseOrderInput extends MoneyDocumentHeading {
  unitSystem: UnitSystem;
  poNumber: string;
  supplier: { name: string; address?: string; contact?: string };
  /** Requested delivery date, ISO 8601. */
  deliveryDateIso: string;
  lines: PurchaseOrderLine[];
  notes?: string;
}

// ---------------------------------------------------------------- marker list and cut ticket

/** How plies are laid (trade terms). */
export type SpreadingMode =
  'face-up-one-way' | 'face-up-both-ways' | 'face-to-face-one-way' | 'face-to-face-zigzag';

/** Garments of each size in one marker, e.g. `[{ size: 'M', count: 2 }]`. */
export interface SizeRatio {
  size: string;
  count: number;
}

/** One roll's share of a lay, as planned. */
export interface RollPlan {
  rollLabel: string;
  shadeLot: string;
  lengthMm: Millimetres;
  pliesToSpread: number;
  expectedRemnantMm: Millimetres;
}

/** One lay (spread) of a cut order. */
export interface LayPlan {
  layNo: number;
  ratio: SizeRatio[];
  markerLengthMm: Millimetres;
  plies: number;
  spreadingMode: SpreadingMode;
  /** Allowance at each end of every ply. */
  endAllowanceMm: Millimetres;
  rolls: RollPlan[];
}

/** The cutter's marker list for one cut order. */
export interface MarkerListInput extends DocumentHeading {
  unitSystem: UnitSystem;
  style: { code: string; name: string };
  batch: { code: string };
  fabric: { description: string; widthMm: Millimetres };
  lays: LayPlan[];
  /**
   * The same plan organised by roll, lays in cutting order (planning's `rollsInCuttingOrder`); when given,
   * the marker list prints one section per roll instead of one rolls table per lay.
   */
  byRoll?: RollCuttingPlan[];
  /** Cutting-room cautions; `CUTTING_ROOM_CAUTIONS` when omitted. */
  cautions?: string[];
}

/** One roll's lays in cutting order and what is left after each. */
export interface RollCuttingPlan {
  rollLabel: string;
  shadeLot: string;
  startLengthMm: Millimetres;
  uses: { layNo: number; plies: number; lengthMm: Millimetres; remainingAfterMm: Millimetres }[];
  expectedRemnantMm: Millimetres;
  /** Kept as stock (a remnant) rather than end-of-roll waste. */
  isStock: boolean;
}

/** One placed copy in a finished marker, as the engine placed it (x along the fabric length, y across). */
export interface MarkerPlacementPlan {
  pieceKey: string;
  size: string;
  pieceName: string;
  rotation: number;
  mirrored: boolean;
  x: number;
  y: number;
}

/** A finished marker to plot at 1:1. Lengths in mm; outlines turned so the grain runs along x. */
export interface MarkerPlotInput extends DocumentHeading {
  /** Units of the lengths printed and of the check bar; default metric. */
  unitSystem?: UnitSystem;
  style: { code: string; name: string };
  batch: { code: string };
  ratio: SizeRatio[];
  lengthMm: number;
  widthMm: number;
  /** Cutting outline per piece key, piece-local, grain along x. */
  outlines: Record<string, { x: number; y: number }[]>;
  /** Notch positions per piece key, same frame as the outline. */
  notches?: Record<string, { x: number; y: number }[]>;
  placements: MarkerPlacementPlan[];
  /** Where plies may be joined: the new roll starts at `near`, the old roll runs to `far` (mm along the marker). */
  spliceZones?: { near: number; far: number }[];
  /** Longest marker length one page carries (mm); longer markers are plotted in panels. Default 5 000. */
  panelLengthMm?: number;
}

/** A cut ticket: one page per lay; the same data as the marker list. */
export type CutTicketInput = MarkerListInput;

// ---------------------------------------------------------------- bundles

/** One bundle of cut pieces. Plies are numbered 1.. from the bottom of the lay. */
export interface BundleRecord {
  bundleNo: number;
  size: string;
  shadeLot: string;
  plyFrom: number;
  plyTo: number;
  pieces: number;
  layNo: number;
  /** Status by operation name, e.g. `{ 'Join shoulders': 'done' }`; missing means not started. */
  statusByOperation?: Record<string, string>;
}

/** One sewing operation of the style's operation list. */
export interface BundleOperation {
  name: string;
  /** Standard allowed minutes per piece. */
  samMinutes: number;
}

/** The bundle register of one batch. */
export interface BundleRegisterInput extends DocumentHeading {
  style: { code: string; name: string };
  batch: { code: string };
  operations: BundleOperation[];
  bundles: BundleRecord[];
}

/** Bundle tickets: one ticket per bundle with a QR code and one tear-off coupon per operation. */
export interface BundleTicketsInput extends BundleRegisterInput {
  bundles: (BundleRecord & { qrText: string })[];
}

// ---------------------------------------------------------------- piece-rate pay

/** Pieces one person completed on one operation in the period. */
export interface PieceworkEntry {
  person: string;
  operation: string;
  pieces: number;
  /** Pay per piece in minor units. */
  ratePerPieceMinor: MinorUnits;
}

/** Piece-rate pay for one period. */
export interface PaySheetInput extends MoneyDocumentHeading {
  /** Period covered, ISO 8601 dates. */
  periodStartIso: string;
  periodEndIso: string;
  entries: PieceworkEntry[];
  approvedBy?: string;
  /** ISO 8601. */
  approvedAtIso?: string;
}
