import { QueryClientProvider } from '@tanstack/react-query';
import { type ReactNode } from 'react';

import { createQueryClient } from '@/hooks/query-config';

/** The app's own client, without garbage-collection timers that would outlive a test. */
export function TestQueryProvider({ children }: { children: ReactNode }) {
  const client = createQueryClient();
  client.setDefaultOptions({
    ...client.getDefaultOptions(),
    queries: { ...client.getDefaultOptions().queries, gcTime: Infinity },
    mutations: { ...client.getDefaultOptions().mutations, gcTime: Infinity },
  });
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}
