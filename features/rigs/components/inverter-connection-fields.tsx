import { type Control, type FieldValues, type Path, useWatch } from 'react-hook-form';

import { ChoiceField, NumberField, SwitchField } from '@/components/form';

/**
 * How the inverter takes its power: wired to the battery, or plugged into an accessory socket (SAE J563,
 * fused at 10, 15 or 20 A: common practice), live only with the ignition or always. `prefix` is where the
 * power system sits in the form ('' on Power, 'power.' in New rig).
 */
export function InverterConnectionFields<T extends FieldValues>({ control, prefix }: { control: Control<T>; prefix: '' | 'power.' }) {
  const name = (field: string) => `${prefix}inverter.${field}` as Path<T>;
  const connection = useWatch({ control, name: name('connection') });
  return (
    <>
      <ChoiceField
        control={control}
        name={name('connection')}
        label="Connected"
        options={[
          { value: 'direct', label: 'Wired to the battery' },
          { value: 'socket', label: 'Plugged into a socket' },
        ]}
      />
      {connection === 'socket' ? (
        <>
          <SwitchField control={control} name={name('socketSwitched')} label="Socket live only with the ignition" hint="Many accessory sockets go dead when the vehicle is off; the inverter then runs only while driving." />
          <NumberField control={control} name={name('socketFuseA')} label="The socket's fuse" unit="A" hint="Usually 10, 15 or 20 A: about 120 to 150 W of AC through it." />
        </>
      ) : null}
    </>
  );
}
