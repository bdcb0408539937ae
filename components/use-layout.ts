import { useSyncExternalStore } from 'react';
import { useWindowDimensions } from 'react-native';

import { WIDE_BREAKPOINT } from '@/shared/theme';

const noSubscription = () => () => {};

/**
 * Whether the window is wide enough for the side rail and two columns. The static web page is rendered
 * without a window, so hydration uses the phone layout (the server snapshot) and the real width applies
 * right after, which keeps hydration free of mismatches.
 */
export function useIsWide(): boolean {
  const { width } = useWindowDimensions();
  const hydrated = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  return hydrated && width >= WIDE_BREAKPOINT;
}

/** Below this width a table shows each row as a card instead (a phone held upright). */
export const CARDS_BELOW = 600;

/** Whether rows should be cards: phone first, like useIsWide (the static page renders as a phone). */
export function useIsNarrow(): boolean {
  const { width } = useWindowDimensions();
  const hydrated = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  return !hydrated || width < CARDS_BELOW;
}
