import { useMemo } from 'react';
import { DEFAULT_FORMAT_SETTINGS, studioFormat, type FormatSettings, type StudioFormat } from '@shared/format/studio-format';
import { useMe } from './auth';

let current: StudioFormat = studioFormat(DEFAULT_FORMAT_SETTINGS);

/**
 * The signed-in studio's formatters, for code outside components (table columns defined at module level).
 * LocaleSync keeps it to the person's settings; components use {@link useFormat}.
 */
export const fmt = () => current;

/** Set by LocaleSync when the person or the studio's settings change. */
export function setFormatSettings(settings: FormatSettings) {
  const s = current.settings;
  if (s.unitSystem !== settings.unitSystem || s.currency !== settings.currency || s.language !== settings.language || s.timeZone !== settings.timeZone) {
    current = studioFormat(settings);
  }
}

/** The formatters of the signed-in person's studio: lengths, fabric, area, money, dates and times. */
export function useFormat(): StudioFormat {
  const me = useMe().data;
  return useMemo(
    () =>
      me
        ? studioFormat({ unitSystem: me.unitSystem, currency: me.currency, language: me.language, timeZone: me.timeZone })
        : current,
    [me],
  );
}

/** Money from integer minor units, in the studio's locale, for the given currency. */
export function formatMoney(minorUnits: number, currency: string): string {
  return currency === current.settings.currency ? current.money(minorUnits) : studioFormat({ ...current.settings, currency }).money(minorUnits);
}

/** A date in the one date style, in the studio's time zone (a `YYYY-MM-DD` day as that day). */
export const formatDate = (value: string | Date) => current.date(value);
/** A date and time in the studio's time zone. */
export const formatDateTime = (value: string | Date) => current.dateTime(value);

/** An efficiency percent as every page shows it (EFFICIENCY_DEFINITION in planning/floor); a dash when none. */
export const formatEfficiency = (percent: number | null) => current.percent(percent);

/**
 * A server message as a sentence for a person: the API prefixes field errors with the field's path
 * ("operations: the style has no sewing operations to balance"), which the screen shows beside the field;
 * in a message on its own the path is dropped and the sentence starts with a capital.
 */
export function sentenceOf(message: string): string {
  const m = /^[A-Za-z][\w.[\]]*: (.+)$/s.exec(message.trim());
  const text = m ? m[1] : message.trim();
  return text.charAt(0).toUpperCase() + text.slice(1);
}
