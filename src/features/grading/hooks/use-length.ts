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
    /** The unit word of a grid cell as the studio's language writes it (`mm`, `in`, `po`). */
    cellUnitWord: system === 'metric' ? 'mm' : f.fabricWidthUnit,
    /** The unit word of a garment length typed in centimetres or inches (`cm`, `in`, `po`). */
    lengthUnitWord: f.fabricWidthUnit,
  };
}
