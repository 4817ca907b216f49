import { fmt } from '@/lib/format';

/** A need or order quantity with its unit; fabric (mm) in the studio's units (metres, or yards and inches). */
export const quantityText = (q: number, unit: string) => (unit === 'mm' ? fmt().fabricLength(q) : `${fmt().number(q, 3)} ${unit}`);
