import { StyleSheet, Text, View } from 'react-native';

import { Body, Heading, Small } from '@/components/ui';
import { useUnits } from '@/components/units';
import { CircuitDrawing } from '@/components/wiring/circuit-drawing';
import type { CableRunResult } from '@/shared/energy/wiring';
import { colors, radius, space, type } from '@/shared/theme';

export type CircuitResultProps = {
  result: CableRunResult;
  /** What the wire feeds, written at the end of the drawn cable. */
  device: string;
  lengthM: number;
  allowedDropPercent: number;
  returnPath: 'cable' | 'chassis';
  /** Warnings about this circuit (a fitted wire too small, a load on the inverter's AC side). */
  warnings?: string[];
  /** Prefix for the test ids, so a list of saved runs can tell its results apart. */
  testID?: string;
};

/**
 * The one answer for a circuit, in Wire a circuit and on each saved run: the drawing (battery, fuse at the
 * battery, cable with its size and drop, device), the size in both measures, the fuse or breaker and where it
 * goes, the next size down and why not, and the cautions beside every drawing.
 */
export function CircuitResult({ result, device, lengthM, allowedDropPercent, returnPath, warnings = [], testID = 'circuit' }: CircuitResultProps) {
  const { units } = useUnits();
  const metric = units.wire === 'mm2';
  const size = metric ? `${result.metric.mm2} mm²` : `${result.awg} AWG`;
  const dropPercent = metric ? result.metric.dropPercent : result.dropPercent;
  const dropV = metric ? result.metric.dropV : result.dropV;
  const fuseA = metric ? result.metric.fuseA : result.fuseA;
  const smaller = metric
    ? result.metricNextSmaller && { size: `${result.metricNextSmaller.mm2} mm²`, ...result.metricNextSmaller }
    : result.nextSmaller && { size: `${result.nextSmaller.awg} AWG`, ...result.nextSmaller };
  return (
    <View style={styles.root} testID={`${testID}-result`}>
      <CircuitDrawing
        testID={`${testID}-drawing`}
        size={size}
        lengthM={lengthM}
        dropPercent={dropPercent}
        allowedDropPercent={allowedDropPercent}
        fuseA={fuseA}
        device={device}
        returnPath={returnPath}
      />
      <View style={styles.figures}>
        <Figure label="AWG" value={result.awg} testID={`${testID}-awg`} />
        <Figure label="mm²" value={String(result.mm2)} testID={`${testID}-mm2`} />
        <Figure label="Fuse or breaker" value={`${fuseA} A`} testID={`${testID}-fuse`} />
      </View>
      <Body testID={`${testID}-drop`} style={dropPercent > allowedDropPercent ? { color: colors.short } : undefined}>
        Drop {dropV.toFixed(2)} V ({dropPercent.toFixed(1)} % of the {allowedDropPercent} % it may lose) over {result.conductorLengthM} m of conductor; the wire carries up to {Math.round(result.ampacityA)} A
        {result.basis ? `, sized for ${result.currentA} A: the ${result.basis.inverterW} W inverter at its ${result.basis.cutoutV} V cut-out, continuous` : `, sized for ${result.currentA} A`}.
      </Body>
      {smaller ? (
        <Small>
          The next size down, {smaller.size}, would drop {smaller.dropPercent.toFixed(1)} % and fails on {smaller.fails.join(' and ')}.
        </Small>
      ) : null}
      <Small>
        {result.fuseKind}; protection between {result.protection.minimumA} A and {result.protection.maximumA} A. {result.protection.placement}
      </Small>
      <Small>
        Breaker: {result.breaker.type} ({result.breaker.standard}). {result.breaker.advice}
      </Small>
      {warnings.map((w) => (
        <Text key={w} role="alert" style={styles.warning}>
          ▲ {w}
        </Text>
      ))}
      <CircuitCautions cautions={result.cautions} testID={`${testID}-cautions`} />
    </View>
  );
}

/** The cautions that go with every drawn circuit (and with a saved run that could not be sized). */
export function CircuitCautions({ cautions, testID }: { cautions: string[]; testID?: string }) {
  return (
    <View style={styles.safety} role="note" testID={testID}>
      <Heading>Before you wire it</Heading>
      {cautions.map((c) => (
        <Small key={c} style={{ color: colors.ink }}>
          • {c}
        </Small>
      ))}
    </View>
  );
}

function Figure({ label, value, testID }: { label: string; value: string; testID: string }) {
  return (
    <View style={styles.figure}>
      <Text style={styles.figureValue} testID={testID}>
        {value}
      </Text>
      <Text style={styles.figureLabel}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  figures: { flexDirection: 'row', gap: space.xl, flexWrap: 'wrap' },
  figure: { gap: 2 },
  figureValue: { ...type.figure, color: colors.night },
  figureLabel: { ...type.small, color: colors.inkSoft },
  warning: { ...type.small, color: colors.short, fontFamily: 'Nunito_700Bold' },
  safety: { backgroundColor: '#FFF4DC', borderColor: colors.lampDeep, borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
});
