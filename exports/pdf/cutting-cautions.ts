/**
 * The usual cutting-room cautions printed on marker lists and cut tickets. Defaults only: local codes decide.
 * Sources: HSE, "Fabric-cutting machinery" (hse.gov.uk/textiles/machinery/cutting.htm) for guards, chain-mail
 * gloves, danger areas and a safe system for changing blades; Vilumsone-Nemes, *Industrial Cutting of Textile
 * Materials*, p. 103 and p. 107 for spread height against the knife; OSHA 29 CFR 1910.212(a)(1) for guarding
 * at the point of operation (as summarised in /work/shared/reference/production-and-costing.md §6).
 */
import type { Language } from '@shared/format/studio-format';
import { documentWords } from '../document-words';

export const CUTTING_ROOM_CAUTIONS: readonly string[] = [
  'Keep the knife guard down and adjusted to the spread; wear the five-finger mesh (chain-mail) glove on the hand that holds the lay.',
  'Keep the ply height within the limit of the knife: below the straight knife blade length, about a quarter of a round knife\u2019s diameter.',
  'Switch the power off and unplug before changing or sharpening blades; dispose of used blades in a closed container.',
  'Mark the danger area around the cutting table and keep others out while a motorised blade is moving.',
  'Clear fluff and off-cuts; never leave a cutting machine running unattended.',
];

/** The usual cautions in the document's language (the English ones above, or their translation). */
export function cuttingRoomCautions(language: Language = 'en'): string[] {
  const t = documentWords(language);
  return [t('cautions.c1'), t('cautions.c2'), t('cautions.c3'), t('cautions.c4'), t('cautions.c5')];
}

/** Heading and footnote printed with the cautions. */
export const CUTTING_ROOM_CAUTIONS_TITLE =
  'Cutting-room cautions (usual cautions; follow local codes)';
export const CUTTING_ROOM_CAUTIONS_SOURCE =
  'Sources: HSE, Fabric-cutting machinery; OSHA 29 CFR 1910.212.';
