import { format, parseISO } from 'date-fns';
import { formatMinorUnits } from '@shared/units/money';

/** Money from integer minor units, formatted by Intl for the currency. */
export const formatMoney = formatMinorUnits;

export const formatDate = (iso: string) => format(parseISO(iso), 'd MMM yyyy');
