import type { Control } from 'react-hook-form';

import { SwitchField } from '@/components/form';
import type { LoadInput } from '@/shared/schemas/projection';

/** Marks a load essential (a CPAP): a Fix that would stop it says so. */
export function EssentialField({ control }: { control: Control<LoadInput> }) {
  return <SwitchField control={control} name="essential" label="Essential" hint="A load you cannot do without, like a CPAP: Fixes that would stop it are marked." />;
}
