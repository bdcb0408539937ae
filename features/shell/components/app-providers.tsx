import { type ReactNode, useState } from 'react';
import { Platform } from 'react-native';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { PageTitle } from '@/components/page-title';
import { fontFiles } from './font-files';

export function AppProviders({ children }: { children: ReactNode }) {
  const [queryClient] = useState(
    () =>
      new QueryClient({
        defaultOptions: {
          // 'always': a request without a connection fails at once (the service worker may answer it from
          // its cache) instead of waiting, paused, for the signal to come back; nothing spins forever.
          queries: { staleTime: 30_000, retry: 1, networkMode: 'always' },
          mutations: { networkMode: 'always' },
        },
      }),
  );
  const [loaded, error] = useFonts(fontFiles);
  // On the web the static page renders at once and the font swaps in; on a device we wait for it.
  if (!loaded && !error && Platform.OS !== 'web') return null;
  return (
    <SafeAreaProvider>
      <PageTitle parts={[]} />
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </SafeAreaProvider>
  );
}
