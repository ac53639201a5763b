import { Button } from '@/components/ui/button';
import { layout } from '@/lib/theme';

/** Takes back the last step: it stays on the path, struck through, and its check comes back. */
export function BackButton({ onBack }: { onBack: (() => void) | null }) {
  return (
    <Button
      testID="step-back"
      icon="back"
      label="Back"
      ariaLabel="Back: take back the last step"
      disabled={!onBack}
      onPress={onBack ?? undefined}
      style={{ minHeight: layout.primaryTouch }}
    />
  );
}
