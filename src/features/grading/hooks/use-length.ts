import { parseLength, type UnitSystem } from '@shared/units/length-format';
import { useFormat } from '@/lib/format';

/** The studio's unit system and formatters (shared/format): metric in cm or mm, imperial to 1/8 in. */
export function useLength() {
  const f = useFormat();
  const system: UnitSystem = f.settings.unitSystem;
  /** A plain decimal as the language writes it in a field (`82,5` in French); fields read both marks back. */
  const decimal = (text: string) => (f.settings.language === 'fr' ? text.replace('.', ',') : text);
  return {
    decimal,
    system,
    /** A length for reading (cm or fractional inches). */
    len: f.length,
    /** A small length (grades, differences): mm or fractional inches. */
    small: f.smallLength,
    /** An area in cm²/m² or in²/yd². */
    area: f.area,
    /** A grid cell's text for a mm value, and back. */
    cell: (v: number) => (system === 'metric' ? decimal(String(Number(v.toFixed(1)))) : f.length(v).replace('"', '')),
    parseCell: (text: string) => parseLength(system === 'metric' ? `${text} mm` : `${text} in`, 'metric'),
    cellUnit: system === 'metric' ? 'mm' : 'in',
    /**
     * A body measurement's cell text for a mm value, and back: centimetres in a metric studio (as
     * EN 13402 and a tape measure write girths), fractional inches in an imperial one.
     */
    bodyCell: (v: number) => (system === 'metric' ? decimal(String(Number((v / 10).toFixed(2)))) : f.length(v).replace('"', '')),
    parseBodyCell: (text: string) => parseLength(system === 'metric' ? `${text} cm` : `${text} in`, 'metric'),
    /** The body chart's unit as the export route takes it, and its word as the studio's language writes it. */
    bodyUnit: system === 'metric' ? ('cm' as const) : ('in' as const),
    bodyUnitWord: f.fabricWidthUnit,
    /** A grade between sizes in the chart's unit: cm to one decimal, or fractional inches. */
    bodyGrade: (v: number) => (system === 'metric' ? f.length(v) : f.smallLength(v)),
    /** The unit word of a grid cell as the studio's language writes it (`mm`, `in`, `po`). */
    cellUnitWord: system === 'metric' ? 'mm' : f.fabricWidthUnit,
    /** The unit word of a garment length typed in centimetres or inches (`cm`, `in`, `po`). */
    lengthUnitWord: f.fabricWidthUnit,
  };
}
