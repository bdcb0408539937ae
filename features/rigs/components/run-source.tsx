import { ChipGroup } from '@/components/chips';

export type RunSource = 'current' | 'load' | 'inverter';

/** Where a cable run takes its current from: typed in, one of the rig's loads, or the rig's inverter (its feed). */
export function RunSourceChips({ value, onChange, hasLoads, hasInverter }: { value: RunSource; onChange: (s: RunSource) => void; hasLoads: boolean; hasInverter: boolean }) {
  const options: { value: RunSource; label: string; testID?: string }[] = [
    { value: 'current', label: 'Enter the current' },
    ...(hasLoads ? [{ value: 'load' as const, label: "Take a load's current", testID: 'run-from-load' }] : []),
    ...(hasInverter ? [{ value: 'inverter' as const, label: 'Feeds the inverter', testID: 'run-from-inverter' }] : []),
  ];
  if (options.length < 2) return null;
  return <ChipGroup label="The run's current" options={options} value={value} onChange={onChange} testIDPrefix="run-from" />;
}
