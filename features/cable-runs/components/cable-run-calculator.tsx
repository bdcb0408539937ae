import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Body, Card, Small, Title } from '@/components/ui';
import { useIsWide } from '@/components/use-layout';
import { fittedWireWarnings } from '@/shared/energy/wiring';
import { type CircuitForm as CalculatorForm, type CircuitInput, circuitToRun } from '@/shared/schemas/circuit';
import { space } from '@/shared/theme';
import { useCableRunSizeMutation } from '../api/size-cable-run';
import { CircuitForm } from './circuit-form';
import { CircuitResult } from './circuit-result';

const defaults: CalculatorForm = {
  systemVoltage: 12,
  end: 'device',
  to: '',
  currentA: 25,
  inverterW: 300,
  efficiencyPercent: 90,
  route: 'cabin',
  cableType: 'xlpe',
  lengthM: 2.5,
  maxDropPercent: 3,
  returnPath: 'cable',
  continuous: false,
};

/** Wire a circuit: start from what is at the end of the wire, say where it runs and in what cable, get it drawn. Nothing is saved. */
export function CableRunCalculator() {
  const wide = useIsWide();
  const mutation = useCableRunSizeMutation();
  const [sized, setSized] = useState<CircuitInput | null>(null);
  const answer = (circuit: CircuitInput) => {
    setSized(circuit);
    mutation.mutate(circuitToRun(circuit));
  };
  const device = (c: CircuitInput) => c.to || (c.end === 'inverter' ? `${c.inverterW} W inverter` : `${c.currentA} A device`);

  return (
    <View style={styles.root} testID="cable-run-calculator">
      <Title>Wire a circuit</Title>
      <Body>Start from what is at the end of the wire; Keyoff sizes the cable and the fuse at the battery and draws the circuit.</Body>
      <View style={[styles.columns, wide && styles.columnsWide]}>
        <View style={wide ? styles.col : undefined}>
          <CircuitForm variant="calculator" initial={defaults} busy={mutation.isPending} error={mutation.error?.message} onSubmit={answer} />
        </View>
        <View style={styles.col}>
          <Card>
            {mutation.data && sized ? (
              <CircuitResult
                result={mutation.data}
                device={device(sized)}
                lengthM={sized.lengthM}
                allowedDropPercent={sized.maxDropPercent}
                returnPath={sized.returnPath}
                warnings={fittedWireWarnings(mutation.data, sized.existingAwg)}
              />
            ) : (
              <Small>Describe the circuit and press “Wire it”.</Small>
            )}
          </Card>
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.lg },
  columns: { gap: space.lg },
  columnsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  col: { flex: 1 },
});
