import { type Control, useWatch } from 'react-hook-form';

import { NumberField, SwitchField } from '@/components/form';
import type { RigPowerInput } from '@/shared/schemas/projection';

/**
 * A LiFePO4 bank takes no charge below 0 °C (its protection system blocks it): a self-heating battery
 * warms itself from the charging source first. Shown for LiFePO4 only.
 */
export function SelfHeatingFields({ control }: { control: Control<RigPowerInput> }) {
  const chemistry = useWatch({ control, name: 'battery.chemistry' });
  const selfHeating = useWatch({ control, name: 'battery.selfHeating' });
  if (chemistry !== 'lifepo4') return null;
  return (
    <>
      <SwitchField
        control={control}
        name="battery.selfHeating"
        label="Self-heating battery"
        hint="Below 0 °C a LiFePO4 battery takes no charge; a self-heating one warms itself from the charger or panels first."
      />
      {selfHeating ? <NumberField control={control} name="battery.heaterW" label="Heater draw while it warms" unit="W" hint="About 50 W for an hour if you leave it empty." /> : null}
    </>
  );
}
