import { StyleSheet, View } from 'react-native';
import type { Check } from '@shared/engine/procedure';
import { Heading, Text } from '@/components/ui/text';
import { CheckPictures } from '@/features/procedures/components/check-pictures';
import { radius, space, useTheme } from '@/lib/theme';
import { CautionList } from './caution-list';
import { meterSetting } from './meter-setting';

/** What to do for one check: its cautions first, then the instruction, where to probe and how to set the meter. */
export function CheckDetails({ check, number }: { check: Check; number: number }) {
  const colors = useTheme();
  return (
    <View style={styles.wrap} testID="check-details">
      <View style={styles.titles}>
        <Text variant="label" tone="textMuted">
          {check.kind === 'finding' ? 'FINDING' : `CHECK ${number} · ${KIND_WORDS[check.kind]}`}
        </Text>
        <Heading testID="check-title">{check.title}</Heading>
      </View>
      <CautionList cautions={check.cautions ?? []} testID="check-cautions" />
      {check.instruction ? <Text testID="check-instruction">{check.instruction}</Text> : null}
      {check.probe || check.kind === 'measure' ? (
        <View style={[styles.facts, { backgroundColor: colors.surfaceSunken }]} testID="check-probe">
          {check.probe?.connector ? <Fact label="Connector" value={check.probe.connector} /> : null}
          {check.probe?.pins?.length ? <Fact label={check.probe.pins.length === 1 ? 'Pin' : 'Pins'} value={check.probe.pins.join(' and ')} mono /> : null}
          {check.probe?.wireColours?.length ? <Fact label="Wires" value={check.probe.wireColours.join(', ')} /> : null}
          {check.kind === 'measure' ? <MeterFacts check={check} /> : null}
        </View>
      ) : null}
      <CheckPictures check={check} />
    </View>
  );
}

const KIND_WORDS: Record<Exclude<Check['kind'], 'finding'>, string> = { measure: 'MEASURE', observe: 'LOOK AND PICK', task: 'DO' };

function MeterFacts({ check }: { check: Extract<Check, { kind: 'measure' }> }) {
  const { dial, range } = meterSetting(check);
  return (
    <>
      <Fact label="Meter" value={dial} />
      <Fact label="Range" value={range} mono />
    </>
  );
}

function Fact({ label, value, mono = false }: { label: string; value: string; mono?: boolean }) {
  return (
    <View style={styles.fact}>
      <Text variant="small" tone="textMuted" style={styles.factLabel}>
        {label}
      </Text>
      <Text variant={mono ? 'mono' : 'bodyStrong'} style={styles.factValue}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  titles: { gap: space.xs },
  facts: { borderRadius: radius.md, padding: space.md, gap: space.sm },
  fact: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md },
  factLabel: { width: 92, paddingTop: 2 },
  factValue: { flex: 1, minWidth: 160 },
});
