import { useState } from 'react';
import { Image, Modal, StyleSheet, View } from 'react-native';
import type { Check, Picture } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { Heading, Text } from '@/components/ui/text';
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
      {check.pictures?.length ? <Pictures pictures={check.pictures} /> : null}
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

/** Diagrams and photos of the check; a tap opens one full size. */
function Pictures({ pictures }: { pictures: Picture[] }) {
  const colors = useTheme();
  const [open, setOpen] = useState<Picture | null>(null);
  return (
    <View style={styles.pictures}>
      {pictures.map((p) => (
        <View key={p.src} style={[styles.thumb, { borderColor: colors.border }]}>
          <Image source={{ uri: p.src }} alt={p.alt} style={styles.thumbImage} resizeMode="cover" />
          <Button testID={`picture-${p.src}`} variant="quiet" icon="plus" label="Enlarge" ariaLabel={`Enlarge: ${p.alt}`} onPress={() => setOpen(p)} />
        </View>
      ))}
      <Modal visible={open !== null} transparent animationType="fade" onRequestClose={() => setOpen(null)}>
        <View style={[styles.viewer, { backgroundColor: colors.chrome }]}>
          {open ? <Image source={{ uri: open.src }} alt={open.alt} style={styles.full} resizeMode="contain" /> : null}
          <Text tone="onChrome">{open?.alt}</Text>
          <Button testID="picture-close" variant="primary" label="Close" onPress={() => setOpen(null)} />
        </View>
      </Modal>
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
  pictures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  thumb: { width: 160, borderWidth: 1, borderRadius: radius.md, overflow: 'hidden' },
  thumbImage: { width: '100%', height: 120 },
  viewer: { flex: 1, padding: space.xl, gap: space.lg, alignItems: 'center', justifyContent: 'center' },
  full: { width: '100%', flex: 1 },
});
