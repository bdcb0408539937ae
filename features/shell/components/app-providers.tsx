import { type ReactNode, useState } from 'react';
import { Platform } from 'react-native';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { SafeAreaProvider } from 'react-native-safe-area-context';

import { fonts } from '@/shared/theme';
import { PageTitle } from './page-title';

// Only the weights the theme uses ship with the app, straight from the package's .ttf files.
const fontFiles = {
  [fonts.regular]: require('@expo-google-fonts/nunito/400Regular/Nunito_400Regular.ttf'),
  [fonts.bold]: require('@expo-google-fonts/nunito/700Bold/Nunito_700Bold.ttf'),
  [fonts.heavy]: require('@expo-google-fonts/nunito/800ExtraBold/Nunito_800ExtraBold.ttf'),
};

export function AppProviders({ children }: { children: ReactNode }) {
  const [queryClient] = useState(
    () => new QueryClient({ defaultOptions: { queries: { staleTime: 30_000, retry: 1 } } }),
  );
  const [loaded, error] = useFonts(fontFiles);
  // On the web the static page renders at once and the font swaps in; on a device we wait for it.
  if (!loaded && !error && Platform.OS !== 'web') return null;
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <PageTitle />
        {children}
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}
