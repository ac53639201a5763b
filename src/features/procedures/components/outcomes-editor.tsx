import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { addCheck, setOutcome, type OutcomeRef } from '@shared/editor/document-edits';
import { edgesOf, VERDICT_LABELS } from '@shared/editor/edges';
import { marginalPolicyOf, requiredVerdicts } from '@shared/engine/outcomes';
import { CHECK_KINDS, type Check, type CheckKind, type ProcedureDocument } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { Heading, Text } from '@/components/ui/text';
import { space, radius, useTheme } from '@/lib/theme';

interface Props {
  check: Check;
  document: ProcedureDocument;
  onEdit: (next: ProcedureDocument) => void;
  onSelect: (id: string) => void;
}

/** Where each outcome of the selected check leads: pick an existing check or add a new one in its place. */
export function OutcomesEditor({ check, document, onEdit, onSelect }: Props) {
  if (check.kind === 'finding') return <Text tone="textMuted">A finding ends the diagnosis: it has no outcomes.</Text>;
  const rows: { ref: OutcomeRef; label: string; target: string | undefined }[] =
    check.kind === 'measure'
      ? [...new Set([...requiredVerdicts(check, marginalPolicyOf(check, document)), ...edgesOf(check).map((e) => ('verdict' in e.ref ? e.ref.verdict : 'in_spec'))])].map((verdict) => ({
          ref: { checkId: check.id, verdict },
          label: VERDICT_LABELS[verdict],
          target: check.outcomes[verdict],
        }))
      : edgesOf(check).map((e) => ({ ref: e.ref, label: e.label, target: e.target }));
  return (
    <View style={styles.list} testID="outcomes">
      <Heading level={3} variant="bodyStrong">
        Outcomes
      </Heading>
      {rows.map((row) => (
        <TargetPicker key={row.label} row={row} document={document} onEdit={onEdit} onSelect={onSelect} />
      ))}
    </View>
  );
}

function TargetPicker({ row, document, onEdit, onSelect }: { row: { ref: OutcomeRef; label: string; target: string | undefined } } & Omit<Props, 'check'>) {
  const colors = useTheme();
  const [open, setOpen] = useState(false);
  const target = row.target ? document.checks.find((c) => c.id === row.target) : undefined;
  const slug = row.label.replace(/\W+/g, '-');
  const pick = (id: string) => {
    onEdit(setOutcome(document, row.ref, id));
    setOpen(false);
  };
  const addHere = (kind: CheckKind) => {
    const added = addCheck(document, kind, row.ref);
    onEdit(added.document);
    setOpen(false);
    onSelect(added.id);
  };
  return (
    <View style={[styles.row, { borderColor: colors.border }]}>
      <View style={styles.rowHead}>
        <Text variant="bodyStrong" style={styles.label}>
          {row.label} →
        </Text>
        <Button
          testID={`outcome-${slug}`}
          label={target ? target.title : row.target ? `Missing “${row.target}”` : 'Not set'}
          ariaLabel={`${row.label} leads to ${target ? target.title : 'nothing yet'}; change`}
          onPress={() => setOpen((o) => !o)}
          selected={open}
          style={styles.grow}
        />
      </View>
      {open ? (
        <View style={styles.menu}>
          {document.checks.map((c) => (
            <Button key={c.id} testID={`outcome-${slug}-to-${c.id}`} variant="row" label={c.title} description={`${c.kind} · ${c.id}`} selected={c.id === row.target} onPress={() => pick(c.id)} />
          ))}
          <Text variant="label" tone="textMuted">
            Add a new check here
          </Text>
          <View style={styles.kinds}>
            {CHECK_KINDS.map((k) => (
              <Button key={k} testID={`outcome-${slug}-new-${k}`} label={`New ${k}`} icon="plus" onPress={() => addHere(k)} />
            ))}
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { borderWidth: 1, borderRadius: radius.md, padding: space.sm, gap: space.sm },
  rowHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  label: { minWidth: 96 },
  grow: { flex: 1, justifyContent: 'flex-start' },
  menu: { gap: space.xs },
  kinds: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xs },
});
