import { useEffect, useState } from 'react';
import { useWindowDimensions } from 'react-native';

import { WIDE_BREAKPOINT } from '@/shared/theme';

/**
 * Whether the window is wide enough for the side rail and two columns. The static web page is rendered
 * without a window, so the first (hydrating) render is always the phone layout; the real width applies
 * right after, which keeps hydration free of mismatches.
 */
export function useIsWide(): boolean {
  const { width } = useWindowDimensions();
  const [mounted, setMounted] = useState(false);
  useEffect(() => setMounted(true), []);
  return mounted && width >= WIDE_BREAKPOINT;
}
