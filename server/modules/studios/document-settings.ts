import { localeFor } from '../../../shared/format/studio-format';
import type { StudioEntity } from '../../entities';

/**
 * What every document builder needs from the studio to speak its language: the locale (the studio's language
 * in the country of its currency), the language of the words and the time zone of its dates.
 */
export function documentSettings(studio: Pick<StudioEntity, 'currency' | 'language' | 'timeZone'>) {
  const language = studio.language ?? 'en';
  return { locale: localeFor(language, studio.currency), language, timeZone: studio.timeZone ?? 'UTC' };
}
