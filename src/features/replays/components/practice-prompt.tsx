import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { PracticeResult } from '@shared/api/replay-types';
import type { PracticeQuestion } from '@shared/practice/questions';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Icon } from '@/components/ui/icon';
import { Heading, Text } from '@/components/ui/text';
import { radius, space, useTheme } from '@/lib/theme';

interface PracticePromptProps {
  question: PracticeQuestion;
  /** The server's score once answered. */
  result: PracticeResult | null;
  onAnswer: (value: string) => void;
  busy: boolean;
  error: string | null;
}

/** Asks before the step is revealed; after the answer, says right or wrong and why, in the engine's words. */
export function PracticePrompt({ question, result, onAnswer, busy, error }: PracticePromptProps) {
  const c = useTheme();
  const [sending, setSending] = useState<string | null>(null);
  return (
    <View testID="practice-prompt" style={[styles.box, { borderColor: c.signal, backgroundColor: c.surface }]}>
      <View style={styles.head}>
        <Text variant="label" tone="textMuted">
          YOUR CALL
        </Text>
        <Heading level={3}>{question.prompt}</Heading>
        {result ? null : (
          <Text variant="small" tone="textMuted">
            {question.asked === 'verdict' ? 'Judge the reading against the spec bar, the meter’s marginal bands included.' : 'Follow the procedure from what was observed.'}
          </Text>
        )}
      </View>
      {result ? (
        <Answered question={question} result={result} />
      ) : (
        <View style={styles.choices} role="group" aria-label={question.prompt}>
          {question.choices.map((choice) => (
            <Button
              key={choice.value}
              testID={`practice-choice-${choice.value}`}
              label={choice.label}
              disabled={busy}
              loading={busy && sending === choice.value}
              onPress={() => {
                setSending(choice.value);
                onAnswer(choice.value);
              }}
              style={styles.choice}
            />
          ))}
        </View>
      )}
      <FormError message={error} testID="practice-error" />
      {result ? <Outcome result={result} /> : null}
    </View>
  );
}

/** The choices once answered: which was yours and which was right, in words and marks as well as colour. */
function Answered({ question, result }: { question: PracticeQuestion; result: PracticeResult }) {
  const c = useTheme();
  return (
    <View role="list" style={styles.choices} testID="practice-answered">
      {question.choices.map((choice) => {
        const right = result.attempt.expected === choice.value;
        const mine = result.attempt.answer === choice.value;
        const tag = right && mine ? 'Your answer, right' : right ? 'Right answer' : mine ? 'Your answer' : null;
        return (
          <View
            key={choice.value}
            role="listitem"
            style={[styles.answered, { borderColor: right ? c.success : mine ? c.danger : c.border, borderWidth: right || mine ? 3 : 1 }]}
          >
            {right || mine ? <Icon name={right ? 'check' : 'alert'} color={right ? c.success : c.danger} /> : <View style={styles.iconSpace} />}
            <Text variant={right || mine ? 'bodyStrong' : 'body'} tone={right || mine ? 'text' : 'textMuted'} style={styles.grow}>
              {choice.label}
            </Text>
            {tag ? (
              <Text variant="label" tone="text">
                {tag.toUpperCase()}
              </Text>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

function Outcome({ result }: { result: PracticeResult }) {
  const c = useTheme();
  const right = result.attempt.correct;
  return (
    <View testID="practice-result" role="status" style={[styles.outcome, { backgroundColor: right ? c.successSoft : c.dangerSoft, borderLeftColor: right ? c.success : c.danger }]}>
      <View style={styles.outcomeHead}>
        <Icon name={right ? 'check' : 'alert'} size={28} color={right ? c.success : c.danger} />
        <Text variant="title" testID="practice-result-word">
          {right ? 'Right' : 'Not this time'}
        </Text>
      </View>
      {right ? null : <Text variant="bodyStrong">{`The answer was: ${result.expectedLabel}.`}</Text>}
      {/* A verdict's reasons follow in the verdict panel under the reading; a next check's are said here. */}
      {result.attempt.asked === 'verdict' ? null : <Text>{result.explanation}</Text>}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 3, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  head: { gap: space.xs },
  choices: { gap: space.sm },
  choice: { justifyContent: 'flex-start', minHeight: 52 },
  answered: { flexDirection: 'row', alignItems: 'center', gap: space.sm, minHeight: 52, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm },
  iconSpace: { width: 24 },
  grow: { flex: 1 },
  outcome: { borderLeftWidth: 5, borderRadius: radius.md, padding: space.md, gap: space.sm },
  outcomeHead: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
});
