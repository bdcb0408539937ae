import { useEffect, useState } from 'react';

import type { Drawings } from './drawings-impl';

let loaded: Drawings | null = null;
let loading: Promise<Drawings> | null = null;

/**
 * On the web the SVG drawings (react-native-svg and every drawing of ours) are one lazy chunk, fetched when
 * a screen first shows a drawing; the first screen loads none of it. Null until it is there: the caller
 * keeps the drawing's space meanwhile.
 */
export function useDrawings(): Drawings | null {
  const [drawings, setDrawings] = useState<Drawings | null>(loaded);
  useEffect(() => {
    if (loaded) return;
    let live = true;
    loading ??= import('./drawings-impl').then((m) => (loaded = m.default));
    loading.then(
      (d) => live && setDrawings(d),
      // Offline before the chunk was ever fetched: the next drawing tries again.
      () => {
        loading = null;
      },
    );
    return () => {
      live = false;
    };
  }, []);
  return drawings;
}
