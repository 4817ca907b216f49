import { formatLength, parseLength, type UnitSystem } from '@shared/units/length-format';
import { useMe } from '@/lib/auth';

/** The studio's unit system and formatters: metric in cm (1 decimal) or mm, imperial to 1/8 in. */
export function useLength() {
  const system: UnitSystem = useMe().data?.unitSystem ?? 'metric';
  return {
    system,
    /** A length for reading (cm or fractional inches). */
    len: (v: number) => formatLength(v, system),
    /** A small length (grades, differences): mm or fractional inches. */
    small: (v: number) => (system === 'metric' ? `${Number(v.toFixed(1))} mm` : formatLength(v, system)),
    /** An area in cm² or in². */
    area: (mm2: number) => (system === 'metric' ? `${(mm2 / 100).toFixed(0)} cm²` : `${(mm2 / 645.16).toFixed(1)} in²`),
    /** A grid cell's text for a mm value, and back. */
    cell: (v: number) => (system === 'metric' ? String(Number(v.toFixed(1))) : formatLength(v, system).replace('"', '')),
    parseCell: (text: string) => parseLength(system === 'metric' ? `${text} mm` : `${text} in`, 'metric'),
    cellUnit: system === 'metric' ? 'mm' : 'in',
  };
}
