import { Text } from '@/components/ui/text';

/** Why closing a diagnosis waits: steps this device still has to send. Nothing when none are waiting. */
export function StepsWaiting({ count, closing, testID }: { count: number; /** e.g. "concluded", "stopped" */ closing: string; testID: string }) {
  if (count === 0) return null;
  return (
    <Text testID={testID} tone="textMuted">
      {count === 1 ? 'One step is' : `${count} steps are`} still waiting to be sent. The diagnosis can be {closing} once the server has the whole path.
    </Text>
  );
}
