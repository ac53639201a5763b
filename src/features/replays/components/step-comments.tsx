import { useState } from 'react';
import { StyleSheet, TextInput, View } from 'react-native';
import type { StepCommentView } from '@shared/api/replay-types';
import { COMMENT_MAX, stepCommentSchema } from '@shared/practice/schemas';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { useAddStepComment } from '@/hooks/use-replays';
import { formatDateTime } from '@/lib/format';
import { radius, space, type, useTheme } from '@/lib/theme';

interface StepCommentsProps {
  diagnosisId: string;
  seq: number;
  comments: StepCommentView[];
  /** Leads and owners may add one. */
  canComment: boolean;
}

/** A lead's remarks on this step, and for leads a box to add one. */
export function StepComments({ diagnosisId, seq, comments, canComment }: StepCommentsProps) {
  const c = useTheme();
  if (!comments.length && !canComment) return null;
  return (
    <View style={styles.section} testID="step-comments">
      <Text variant="label" tone="textMuted">
        {comments.length ? `COMMENTS (${comments.length})` : 'COMMENTS'}
      </Text>
      {comments.map((comment) => (
        <View key={comment.id} testID={`step-comment-${comment.id}`} style={[styles.comment, { backgroundColor: c.primarySoft, borderLeftColor: c.primary }]}>
          <Text variant="small" tone="textMuted">{`${comment.author} · ${formatDateTime(comment.createdAt)}`}</Text>
          <Text>{comment.body}</Text>
        </View>
      ))}
      {canComment ? <AddComment key={seq} diagnosisId={diagnosisId} seq={seq} /> : null}
    </View>
  );
}

function AddComment({ diagnosisId, seq }: { diagnosisId: string; seq: number }) {
  const c = useTheme();
  const [body, setBody] = useState('');
  const [focused, setFocused] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const add = useAddStepComment(diagnosisId);
  const labelId = `comment-label-${seq}`;

  const submit = async () => {
    setError(null);
    try {
      const input = await stepCommentSchema.validate({ body });
      await add.trigger({ seq, body: input.body });
      setBody('');
    } catch (e) {
      setError((e as Error).message);
    }
  };

  return (
    <View style={styles.form}>
      <Text nativeID={labelId} variant="bodyStrong">
        Add a comment for whoever replays this step
      </Text>
      <TextInput
        testID="comment-input"
        aria-labelledby={labelId}
        value={body}
        onChangeText={setBody}
        onFocus={() => setFocused(true)}
        onBlur={() => setFocused(false)}
        multiline
        maxLength={COMMENT_MAX}
        placeholder="What should a learner notice here?"
        placeholderTextColor={c.textMuted}
        style={[styles.input, type.body, { color: c.text, backgroundColor: c.surface, borderColor: focused ? c.primary : c.borderStrong, borderWidth: focused ? 2 : 1 }]}
      />
      <FormError message={error} testID="comment-error" />
      <Button testID="comment-submit" label="Post comment" variant="primary" loading={add.isMutating} onPress={() => void submit()} style={styles.submit} />
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.sm },
  comment: { borderLeftWidth: 5, borderRadius: radius.md, padding: space.md, gap: space.xs },
  form: { gap: space.sm },
  input: { minHeight: 96, borderRadius: radius.md, paddingHorizontal: space.md, paddingVertical: space.sm, textAlignVertical: 'top' },
  submit: { alignSelf: 'flex-start' },
});
