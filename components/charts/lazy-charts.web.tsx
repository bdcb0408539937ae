import { useEffect, useState } from 'react';

import type { Charts } from './charts-impl';

let loading: Promise<Charts> | null = null;

// The web build names canvaskit.wasm by its content (scripts/lib.sh sets this before the export and
// scripts/finish-web.ts renames the file), so browsers may keep it for good. `npm run dev` serves it as is.
const CANVASKIT_WASM = process.env.EXPO_PUBLIC_CANVASKIT_WASM;
const locateFile = (file: string) => `/${file === 'canvaskit.wasm' && CANVASKIT_WASM ? CANVASKIT_WASM : file}`;

/**
 * On the web Skia builds its API from CanvasKit when first imported, so CanvasKit (served from our own
 * origin) loads first and the charts' code follows as one lazy chunk. Screens without a chart load neither.
 */
export function useCharts(): Charts | null {
  const [charts, setCharts] = useState<Charts | null>(null);
  useEffect(() => {
    let live = true;
    loading ??= (async () => {
      const { LoadSkiaWeb } = await import('@shopify/react-native-skia/lib/module/web');
      await LoadSkiaWeb({ locateFile });
      return (await import('./charts-impl')).default;
    })();
    loading.then((c) => live && setCharts(c));
    return () => {
      live = false;
    };
  }, []);
  return charts;
}
