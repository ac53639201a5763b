import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { mutate } from 'swr';
import type { ProcedureSummary } from '@shared/api/procedure-types';
import type { JobView } from '@shared/api/workshop-types';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { DIAGNOSIS_LISTS, diagnosisKey, useStartDiagnosis } from '@/hooks/use-diagnosis';
import { useRequestKey } from '@/lib/idempotency-key';
import { layout, space } from '@/lib/theme';
import { BeforeFirstCheck } from './start/before-first-check';
import { JobPicker } from './start/job-picker';
import { keepLastStart } from './start/last-used';
import { machineName } from './start/machine-name';
import { MeterAndAmbient } from './start/meter-and-ambient';
import { NewJobForm } from './start/new-job-form';
import { ProcedurePicker } from './start/procedure-picker';

type Stage = 'job' | 'new-job' | 'procedure' | 'meter' | 'cautions';

const STAGES: { stage: Stage; title: string }[] = [
  { stage: 'job', title: 'Job and machine' },
  { stage: 'procedure', title: 'Procedure' },
  { stage: 'meter', title: 'Meter and temperature' },
  { stage: 'cautions', title: 'Before the first check' },
];

/** Starting a diagnosis: the job, a published procedure, the meter and the bay temperature, then the cautions. */
export function StartScreen() {
  const router = useRouter();
  const [stage, setStage] = useState<Stage>('job');
  const [job, setJob] = useState<JobView | null>(null);
  const [procedure, setProcedure] = useState<ProcedureSummary | null>(null);
  const [setup, setSetup] = useState<{ meterId: string; ambientC: number } | null>(null);
  const start = useStartDiagnosis();
  const requestKey = useRequestKey();
  const [error, setError] = useState<string | null>(null);

  const index = STAGES.findIndex((s) => s.stage === (stage === 'new-job' ? 'job' : stage));
  const previous: Stage | null = stage === 'new-job' ? 'job' : index > 0 ? STAGES[index - 1].stage : null;

  const begin = async () => {
    if (!job || !procedure?.latestPublished || !setup) return;
    setError(null);
    const input = { procedureId: procedure.id, versionNumber: procedure.latestPublished, jobId: job.id, ...setup };
    try {
      const { diagnosis } = await start.trigger({ input, key: requestKey(input) });
      keepLastStart(setup);
      await mutate(diagnosisKey(diagnosis.id), { diagnosis }, { revalidate: false });
      void mutate(DIAGNOSIS_LISTS);
      router.replace(`/bench/diagnosis/${diagnosis.id}`);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The diagnosis did not start. Try again.');
    }
  };

  return (
    <Screen testID="start-screen" title="Start a diagnosis" subtitle={`Step ${index + 1} of ${STAGES.length}: ${STAGES[index].title}`} width="form">
      {job && stage !== 'job' && stage !== 'new-job' ? (
        <Card testID="start-summary">
          <Text variant="bodyStrong">
            {job.customerName} · {machineName(job.machine)}
          </Text>
          <Text variant="small" tone="textMuted">
            “{job.complaint}”
          </Text>
          {procedure && stage !== 'procedure' ? <Text variant="small">Procedure: {procedure.title}</Text> : null}
        </Card>
      ) : null}

      {stage === 'job' ? (
        <JobPicker
          onNew={() => setStage('new-job')}
          onPick={(j) => {
            setJob(j);
            setStage('procedure');
          }}
        />
      ) : null}
      {stage === 'new-job' ? (
        <NewJobForm
          onCancel={() => setStage('job')}
          onCreated={(j) => {
            void mutate('/api/jobs');
            void mutate('/api/machines');
            setJob(j);
            setStage('procedure');
          }}
        />
      ) : null}
      {stage === 'procedure' && job ? (
        <ProcedurePicker
          job={job}
          onPick={(p) => {
            setProcedure(p);
            setStage('meter');
          }}
        />
      ) : null}
      {stage === 'meter' ? (
        <MeterAndAmbient
          onDone={(meterId, ambientC) => {
            setSetup({ meterId, ambientC });
            setStage('cautions');
          }}
        />
      ) : null}
      {stage === 'cautions' && procedure ? <BeforeFirstCheck procedure={procedure} starting={start.isMutating} error={error} onStart={() => void begin()} /> : null}

      <View style={styles.back}>
        {previous ? (
          <Button testID="start-back" icon="back" variant="quiet" label={`Back to ${STAGES.find((s) => s.stage === previous)!.title.toLowerCase()}`} onPress={() => setStage(previous)} style={styles.tall} />
        ) : (
          <Button testID="start-cancel" icon="back" variant="quiet" label="Back to my bench" onPress={() => router.navigate('/bench')} style={styles.tall} />
        )}
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  back: { alignItems: 'flex-start', gap: space.sm },
  tall: { minHeight: layout.primaryTouch },
});
