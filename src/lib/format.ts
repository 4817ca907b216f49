import { format, parseISO } from 'date-fns';
import { formatMinorUnits } from '@shared/units/money';

/** Money from integer minor units, formatted by Intl for the currency. */
export const formatMoney = formatMinorUnits;

export const formatDate = (iso: string) => format(parseISO(iso), 'd MMM yyyy');

/** An efficiency percent as every page shows it (EFFICIENCY_DEFINITION in planning/floor); a dash when none. */
export const formatEfficiency = (percent: number | null) => (percent === null ? '–' : `${percent.toFixed(1)} %`);
