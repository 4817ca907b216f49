import { Caution } from '@/components/ui/page';

/**
 * Cutting-room cautions. Sources as in /work/shared/reference/production-and-costing.md §6: HSE "Fabric-cutting
 * machinery" (guards, mesh gloves, safe blade changes) and OSHA 29 CFR 1910.212(a)(1) (guarding at the point of
 * operation); spread height against the knife from Vilumsone-Nemes, Industrial Cutting of Textile Materials, p. 103.
 */
export function CuttingCautions() {
  return (
    <Caution
      title="Cutting-room cautions"
      items={[
        'Keep the knife guard down to the spread and wear the mesh (chain-mail) glove on the hand that holds the lay.',
        'Keep the ply height within the limit of your knife: below the straight blade length, about a quarter of a round knife’s diameter.',
        'Switch off and unplug before changing or sharpening a blade.',
        'Keep others out of the cutting area while a powered blade is moving.',
      ]}
      source="Sources: HSE, Fabric-cutting machinery; OSHA 29 CFR 1910.212(a)(1); Vilumsone-Nemes, Industrial Cutting of Textile Materials, p. 103."
    />
  );
}
