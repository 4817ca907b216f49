import { i18n } from '@/lib/i18n';
import { area } from '../words';

/**
 * A machine type as a person reads it: the studio's standard types (MACHINE_TYPES) in the person's language; a type
 * the studio typed itself stays as typed. The stored value never changes.
 */
export function machineTypeLabel(type: string): string {
  return i18n.t(`${area}.machineTypes.${type}`, { defaultValue: type });
}
