import { useState } from 'react';
import { type Control, type UseFormSetValue, useWatch } from 'react-hook-form';

import { NumberField } from '@/components/form';
import type { CableRunSizeForm } from '@/shared/schemas/cable-run';

import { SwitchFieldPlain } from './switch-plain';

/**
 * The run's current, or for an inverter's feed its rated watts: the feed is then sized at the inverter's
 * 10.5 V cut-out through its efficiency, as a continuous load.
 */
export function CurrentOrInverterFields({ control, setValue }: { control: Control<CableRunSizeForm>; setValue: UseFormSetValue<CableRunSizeForm> }) {
  const purpose = useWatch({ control, name: 'purpose' });
  const [fromWatts, setFromWatts] = useState(false);
  const useWatts = purpose === 'inverter' && fromWatts;
  const choose = (on: boolean) => {
    setFromWatts(on);
    setValue('currentA', on ? undefined : 25);
    setValue('inverterW', on ? 1000 : undefined);
  };
  return (
    <>
      {purpose === 'inverter' ? <SwitchFieldPlain label="Size it from the inverter's rating" value={fromWatts} onChange={choose} testID="size-from-inverter" /> : null}
      {useWatts ? (
        <>
          <NumberField control={control} name="inverterW" label="Inverter rating" unit="W" hint="Sized at its 10.5 V cut-out, as a continuous load." />
          <NumberField control={control} name="inverterEfficiencyPercent" label="Inverter efficiency" unit="%" />
        </>
      ) : (
        <NumberField control={control} name="currentA" label="Current" unit="A" hint="The most the device draws from the battery." />
      )}
    </>
  );
}
