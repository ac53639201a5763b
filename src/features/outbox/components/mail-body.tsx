import { Link } from 'expo-router';
import { Text } from '@/components/ui/text';
import { useTheme } from '@/lib/theme';

const URL_PATTERN = /(https?:\/\/[^\s<>"]+)/g;

/** A message's plain text with every web address made a link you can follow. */
export function MailBody({ text }: { text: string }) {
  const colors = useTheme();
  return (
    <Text testID="mail-body" selectable>
      {text.split(URL_PATTERN).map((part, i) =>
        i % 2 === 1 ? (
          <Link key={i} href={part} testID="mail-link" style={{ color: colors.primary, textDecorationLine: 'underline' }}>
            {part}
          </Link>
        ) : (
          part
        ),
      )}
    </Text>
  );
}
