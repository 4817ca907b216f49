import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Card, ErrorNote } from '@/components/ui/page';
import { floorDeviceQueries, useBindFloorDevice, useUnbindFloorDevice } from '@/lib/auth';

/**
 * The owner makes the device in hand the studio's floor tablet: once bound, its sign-in page lists the
 * machinists and finishers by name and takes only a PIN. Done on the tablet itself.
 */
export function FloorTabletCard() {
  const floor = useQuery(floorDeviceQueries.list());
  const bind = useBindFloorDevice();
  const unbind = useUnbindFloorDevice();
  const [label, setLabel] = useState('Floor tablet');
  const isBound = Boolean(floor.data);
  return (
    <Card title="Floor tablet" className="mb-5">
      {isBound ? (
        <div className="space-y-3 text-sm">
          <p>
            This device is the studio’s floor tablet: after you sign out, its sign-in page lists your machinists and finishers by
            name and each types only their PIN.
          </p>
          <button type="button" className="btn-quiet" disabled={unbind.isPending} onClick={() => unbind.mutate()}>
            Stop using this device as the floor tablet
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
          <p className="w-full text-ink-600">
            On a tablet that stays in the studio, make it the floor tablet: people then pick their name and type their PIN, with no
            e-mail. Personal phones keep signing in with e-mail and PIN.
          </p>
          <div className="flex-1">
            <label className="field-label" htmlFor="floor-tablet-label">Name of this tablet</label>
            <input id="floor-tablet-label" className="field-input" maxLength={80} value={label} onChange={(e) => setLabel(e.target.value)} />
          </div>
          <button type="submit" className="btn-primary" disabled={bind.isPending}>
            Use this device as the floor tablet
          </button>
        </form>
      )}
      <ErrorNote error={bind.error ?? unbind.error} />
    </Card>
  );
}
