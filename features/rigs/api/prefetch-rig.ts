import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { usePathname } from 'expo-router';

import { outlookQueryOptions, rigQueryOptions } from './rig';

/**
 * Opened straight on a rig's address (a reload, a bookmark), the rig and its Outlook are asked for at
 * once, beside the session check, instead of one round trip after it: on a weak signal that round trip
 * is the difference between the headline figures now and a moment later. (The server checks each request.)
 */
export function usePrefetchRigFromAddress() {
  const client = useQueryClient();
  const pathname = usePathname();
  useEffect(() => {
    const [, rigId, tab] = pathname.match(/^\/rigs\/([^/]+)(\/[^/]+)?\/?$/) ?? [];
    if (!rigId || rigId === 'new') return;
    void client.prefetchQuery(rigQueryOptions(rigId));
    if (!tab) void client.prefetchQuery(outlookQueryOptions(rigId));
    // Only the address the app was opened on: later moves go through the screens' own queries.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
}
