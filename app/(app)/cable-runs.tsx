import { CableRunCalculator } from '@/features/cable-runs/components/cable-run-calculator';

export default function CableRuns() {
  return <CableRunCalculator />;
}
