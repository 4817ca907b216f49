import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Card, ErrorNote } from '@/components/ui/page';
import { floorDeviceQueries, useBindFloorDevice, useUnbindFloorDevice } from '@/lib/auth';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

/**
 * The owner makes the device in hand the studio's floor tablet: once bound, its sign-in page lists the
 * machinists and finishers by name and takes only a PIN. Done on the tablet itself.
 */
export function FloorTabletCard() {
  const { t } = useTranslation();
  const floor = useQuery(floorDeviceQueries.list());
  const bind = useBindFloorDevice();
  const unbind = useUnbindFloorDevice();
  const [label, setLabel] = useState(() => t(`${area}.tablet.defaultName`));
  const isBound = Boolean(floor.data);
  return (
    <Card title={t(`${area}.tablet.title`)} className="mb-5">
      {isBound ? (
        <div className="space-y-3 text-sm">
          <p>{t(`${area}.tablet.bound`)}</p>
          <button type="button" className="btn-quiet" disabled={unbind.isPending} onClick={() => unbind.mutate()}>
            {t(`${area}.tablet.stop`)}
          </button>
        </div>
      ) : (
        <form
          className="flex flex-wrap items-end gap-2 text-sm"
          onSubmit={(e) => {
            e.preventDefault();
            bind.mutate(label);
          }}
        >
          <p className="w-full text-ink-600">{t(`${area}.tablet.intro`)}</p>
          <div className="flex-1">
            <label className="field-label" htmlFor="floor-tablet-label">{t(`${area}.tablet.name`)}</label>
            <input id="floor-tablet-label" className="field-input" maxLength={80} value={label} onChange={(e) => setLabel(e.target.value)} />
          </div>
          <button type="submit" className="btn-primary" disabled={bind.isPending}>
            {t(`${area}.tablet.use`)}
          </button>
        </form>
      )}
      <ErrorNote error={bind.error ?? unbind.error} />
    </Card>
  );
}
