import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { VersionInsight } from '@shared/api/replay-types';
import type { Check } from '@shared/engine/procedure';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { EmptyState } from '@/components/ui/empty-state';
import { ErrorState } from '@/components/ui/error-state';
import { Icon } from '@/components/ui/icon';
import { LoadingState } from '@/components/ui/loading-state';
import { Screen } from '@/components/ui/screen';
import { Heading, Text } from '@/components/ui/text';
import { BarList } from '@/features/replays/components/bar-list';
import { ProcedureDiagram } from '@/features/replays/components/procedure-diagram';
import { edgeKey, formatDuration } from '@/features/replays/replay-path';
import { useVersionInsight } from '@/hooks/use-insight';
import { useProcedure, useProcedures } from '@/hooks/use-procedures';
import { layoutProcedure } from '@/lib/procedure-layout';
import { useUser } from '@/lib/session';
import { radius, space, useBreakpoints, useTheme } from '@/lib/theme';

/** For leads: what the concluded diagnoses of each procedure version say about it. */
export function InsightScreen() {
  const user = useUser();
  const router = useRouter();
  const lead = user.role === 'lead' || user.role === 'owner';
  return (
    <Screen
      testID="insight-screen"
      title="Insight"
      subtitle="What the concluded diagnoses of each procedure version say: where they end, which way they go, how long each check takes."
      actions={<Button testID="insight-to-replays" label="All replays" icon="back" variant="quiet" onPress={() => router.navigate('/replays')} />}
    >
      {lead ? (
        <Picker />
      ) : (
        <EmptyState icon="lock" title="Insight is for leads" body="Leads and the shop owner see how procedures perform. Your replays and practice are under Replays." />
      )}
    </Screen>
  );
}

function Picker() {
  const procedures = useProcedures();
  const [picked, setPicked] = useState<string | null>(null);
  const [version, setVersion] = useState<number | null>(null);
  const runnable = (procedures.data?.procedures ?? []).filter((p) => p.latestVersion !== null);
  const procedureId = picked ?? runnable[0]?.id ?? null;
  const detail = useProcedure(procedureId ?? undefined);
  const numbers = (detail.data?.procedure.versions ?? []).flatMap((v) => (v.number === null ? [] : [{ number: v.number, status: v.status }]));
  const number = version ?? numbers[0]?.number ?? null;

  if (procedures.error) return <ErrorState title="Couldn't load the procedures" error={procedures.error} onRetry={() => void procedures.mutate()} />;
  if (!procedures.data) return <LoadingState label="Loading procedures…" />;
  if (runnable.length === 0) {
    return <EmptyState icon="procedures" title="No published procedure yet" body="Insight appears once a procedure is published and diagnoses on it are concluded." />;
  }
  return (
    <View style={styles.section}>
      <View style={styles.group} role="group" aria-label="Procedure">
        <Text variant="label" tone="textMuted">
          PROCEDURE
        </Text>
        <View style={styles.choices}>
          {runnable.map((p) => (
            <Button
              key={p.id}
              testID={`insight-procedure-${p.id}`}
              label={p.title}
              selected={p.id === procedureId}
              onPress={() => {
                setPicked(p.id);
                setVersion(null);
              }}
            />
          ))}
        </View>
      </View>
      {numbers.length ? (
        <View style={styles.group} role="group" aria-label="Version">
          <Text variant="label" tone="textMuted">
            VERSION
          </Text>
          <View style={styles.choices}>
            {numbers.map((v) => (
              <Button
                key={v.number}
                testID={`insight-version-${v.number}`}
                label={`Version ${v.number}${v.status === 'retired' ? ' (retired)' : ''}`}
                selected={v.number === number}
                onPress={() => setVersion(v.number)}
              />
            ))}
          </View>
        </View>
      ) : null}
      {procedureId && number ? <VersionReport procedureId={procedureId} number={number} /> : null}
    </View>
  );
}

function VersionReport({ procedureId, number }: { procedureId: string; number: number }) {
  const insight = useVersionInsight(procedureId, number);
  if (insight.error) return <ErrorState title="Couldn't work out the insight" error={insight.error} onRetry={() => void insight.mutate()} />;
  if (!insight.data) return <LoadingState label="Working it out…" />;
  if (insight.data.insight.diagnoses === 0) {
    return (
      <EmptyState
        testID="insight-empty"
        icon="replays"
        title="No concluded diagnoses on this version yet"
        body="Counts, times and expectations appear here as soon as technicians conclude diagnoses on it."
      />
    );
  }
  return <Report insight={insight.data.insight} />;
}

function Report({ insight }: { insight: VersionInsight }) {
  const { isDesk } = useBreakpoints();
  const checkOf = (id: string): Check | undefined => insight.document.checks.find((c) => c.id === id);
  const title = (id: string) => checkOf(id)?.title ?? id;
  const layout = useMemo(() => layoutProcedure(insight.document), [insight.document]);
  const counts = useMemo(() => new Map(insight.edges.map((e) => [edgeKey(e.from, e.to), e.count])), [insight.edges]);
  const path = useMemo(() => ({ visited: new Set(insight.checks.map((c) => c.checkId).concat(insight.findings.map((f) => f.checkId))), taken: new Set(counts.keys()), detours: new Set<string>() }), [insight, counts]);
  const inOrder = [...insight.checks].sort((a, b) => a.meanPosition - b.meanPosition);
  const n = insight.diagnoses;

  const numbers = (
    <View style={styles.stats}>
      <Stat label="Concluded diagnoses" value={String(n)} testID="insight-count" />
      <Stat label="Median time per diagnosis" value={insight.medianDiagnosisMs === null ? '—' : formatDuration(insight.medianDiagnosisMs)} />
      <Stat label="Expected checks to a finding" value={insight.expected ? insight.expected.checks.toFixed(1) : '—'} testID="insight-expected-checks" />
      <Stat label="Expected time to a finding" value={insight.expected ? formatDuration(insight.expected.ms) : '—'} />
    </View>
  );
  const charts = (
    <View style={styles.section}>
      {insight.suggestion ? <Suggestion insight={insight} title={title} /> : null}
      <Card>
        <Heading level={2}>Findings reached</Heading>
        <BarList
          label="Findings reached"
          testID="insight-findings"
          bars={insight.findings.map((f) => ({ key: f.checkId, label: title(f.checkId), value: f.count, text: `${f.count} of ${n}` }))}
        />
      </Card>
      <Card>
        <Heading level={2}>Median time per check</Heading>
        <Text variant="small" tone="textMuted">
          In the order the checks run on average, with how often each ended the case.
        </Text>
        <BarList
          label="Median time per check"
          testID="insight-times"
          bars={inOrder.map((c) => ({
            key: c.checkId,
            label: `${title(c.checkId)} · ran ${c.visits}× · decided ${Math.round(100 * c.decides)} %`,
            value: c.medianMs,
            text: formatDuration(c.medianMs),
          }))}
        />
      </Card>
    </View>
  );
  const diagram = (
    <View style={[styles.section, isDesk && styles.diagramPane]}>
      <Heading level={2}>How often each outcome was taken</Heading>
      <ProcedureDiagram
        layout={layout}
        path={path}
        currentId={null}
        currentTag=""
        height={isDesk ? 640 : 440}
        counts={counts}
        summary={`Procedure diagram with outcome counts: ${insight.edges.map((e) => `${title(e.from)} to ${title(e.to)} ${e.count} times`).join('; ')}.`}
      />
    </View>
  );

  return (
    <View style={styles.section} testID="insight-report">
      {numbers}
      {isDesk ? (
        <View style={styles.split}>
          <View style={styles.fill}>{charts}</View>
          {diagram}
        </View>
      ) : (
        <>
          {charts}
          {diagram}
        </>
      )}
    </View>
  );
}

function Stat({ label, value, testID }: { label: string; value: string; testID?: string }) {
  const c = useTheme();
  return (
    <View style={[styles.stat, { backgroundColor: c.surface, borderColor: c.border }]} testID={testID}>
      <Text variant="label" tone="textMuted">
        {label.toUpperCase()}
      </Text>
      <Text variant="display">{value}</Text>
    </View>
  );
}

/** The cheap check that often decides the case but sits late, in a sentence a lead can act on. */
function Suggestion({ insight, title }: { insight: VersionInsight; title: (id: string) => string }) {
  const c = useTheme();
  const s = insight.suggestion!;
  const late = insight.checks.find((x) => x.checkId === s.checkId)!;
  const early = insight.checks.find((x) => x.checkId === s.afterCheckId)!;
  const pct = (share: number) => `${Math.round(100 * share)} %`;
  return (
    <View testID="insight-suggestion" style={[styles.suggestion, { backgroundColor: c.warningSoft, borderLeftColor: c.warning }]}>
      <Icon name="alert" color={c.warning} size={28} />
      <View style={styles.fill}>
        <Text variant="title">Worth checking earlier: {title(s.checkId)}</Text>
        <Text>
          {`It takes a median ${formatDuration(late.medianMs)} and ended the case in ${pct(late.decides)} of its ${late.visits} runs, yet it comes at step ${late.meanPosition.toFixed(1)} on average, after “${title(s.afterCheckId)}” (${formatDuration(early.medianMs)}, ended the case in ${pct(early.decides)}). Checking in order of time per case decided keeps diagnoses short, if nothing in the procedure needs the earlier check first.`}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.lg },
  group: { gap: space.sm },
  choices: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  stats: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  stat: { flexGrow: 1, flexBasis: 200, borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.xs },
  split: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  fill: { flex: 1, gap: space.xs },
  diagramPane: { width: '48%' },
  suggestion: { flexDirection: 'row', gap: space.md, borderLeftWidth: 5, borderRadius: radius.md, padding: space.lg },
});
