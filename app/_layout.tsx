import { useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { SWRConfig } from 'swr';
import { SplashScreen } from '@/features/shell/splash-screen';
import '@/lib/focus-ring';
import { ApiError, fetcher } from '@/lib/api';
import { SessionProvider } from '@/lib/session';
import { fonts } from '@/lib/theme';

export { CrashScreen as ErrorBoundary } from '@/features/shell/crash-screen';

const swrConfig = {
  fetcher,
  // A 4xx answer won't change by asking again; network and server errors might.
  shouldRetryOnError: (error: Error) => !(error instanceof ApiError && error.status >= 400 && error.status < 500),
};

export default function RootLayout() {
  const [loaded, failed] = useFonts({
    [fonts.regular]: require('../fonts/AtkinsonHyperlegibleNext-Regular.ttf'),
    [fonts.semiBold]: require('../fonts/AtkinsonHyperlegibleNext-SemiBold.ttf'),
    [fonts.bold]: require('../fonts/AtkinsonHyperlegibleNext-Bold.ttf'),
    [fonts.mono]: require('../fonts/JetBrainsMono-Medium.ttf'),
    [fonts.monoBold]: require('../fonts/JetBrainsMono-Bold.ttf'),
  });
  // If a font fails to load, carry on in the system font rather than stay on the splash.
  if (!loaded && !failed) return <SplashScreen />;

  return (
    <SWRConfig value={swrConfig}>
      <SessionProvider>
        <StatusBar style="auto" />
        <Slot />
      </SessionProvider>
    </SWRConfig>
  );
}
