import { Caution } from '@/components/ui/page';
import { useTranslation } from '@/lib/i18n';

/**
 * Cutting-room cautions. Sources as in /work/shared/reference/production-and-costing.md §6: HSE "Fabric-cutting
 * machinery" (guards, mesh gloves, safe blade changes) and OSHA 29 CFR 1910.212(a)(1) (guarding at the point of
 * operation); spread height against the knife from Vilumsone-Nemes, Industrial Cutting of Textile Materials, p. 103.
 */
export function CuttingCautions() {
  const { t } = useTranslation();
  return (
    <Caution
      title={t('cutter.cautions.title')}
      items={[t('cutter.cautions.c1'), t('cutter.cautions.c2'), t('cutter.cautions.c3'), t('cutter.cautions.c4')]}
      source={t('cutter.cautions.source')}
    />
  );
}
