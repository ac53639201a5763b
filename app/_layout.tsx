import { FontDisplay, useFonts } from 'expo-font';
import { Slot } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { SWRConfig } from 'swr';
import { SplashScreen } from '@/features/shell/splash-screen';
import '@/lib/focus-ring';
import { ApiError, fetcher } from '@/lib/api';
import { startEarlyRequests } from '@/lib/early-requests';
import { SessionProvider } from '@/lib/session';
import { fonts } from '@/lib/theme';

export { CrashScreen as ErrorBoundary } from '@/features/shell/crash-screen';

const swrConfig = {
  fetcher,
  // A 4xx answer won't change by asking again; network and server errors might.
  shouldRetryOnError: (error: Error) => !(error instanceof ApiError && error.status >= 400 && error.status < 500),
};

startEarlyRequests();

export default function RootLayout() {
  // The text faces (preloaded by the page) hold the first paint back; the reading face swaps in when it
  // arrives, so it never delays a screen.
  const [loaded, failed] = useFonts({
    [fonts.regular]: require('../fonts/AtkinsonHyperlegibleNext-Regular.ttf'),
    [fonts.semiBold]: require('../fonts/AtkinsonHyperlegibleNext-SemiBold.ttf'),
    [fonts.bold]: require('../fonts/AtkinsonHyperlegibleNext-Bold.ttf'),
  });
  useFonts({
    [fonts.mono]: { uri: require('../fonts/JetBrainsMono-Medium.ttf'), display: FontDisplay.SWAP },
    [fonts.monoBold]: { uri: require('../fonts/JetBrainsMono-Bold.ttf'), display: FontDisplay.SWAP },
  });

  return (
    <SWRConfig value={swrConfig}>
      <SessionProvider>
        <StatusBar style="auto" />
        {/* If a font fails to load, carry on in the system font rather than stay on the splash. */}
        {loaded || failed ? <Slot /> : <SplashScreen />}
      </SessionProvider>
    </SWRConfig>
  );
}
