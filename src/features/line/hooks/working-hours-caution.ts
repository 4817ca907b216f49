import { WORKING_HOURS_CAUTION } from '@planning';
import { i18n } from '@/lib/i18n';
import { area } from '../words';

/**
 * The usual working-hours caution (planning's WORKING_HOURS_CAUTION, sent by the server as written) in the person's
 * language; any other caution the server sends is shown as it comes.
 */
export function workingHoursCaution(caution: string): string {
  return caution === WORKING_HOURS_CAUTION ? i18n.t(`${area}.workingHoursCaution`) : caution;
}
