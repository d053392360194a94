import type { ReactNode } from 'react';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';

/** Props of Providers. */
export interface ProvidersProps {
  /** The query client (see createQueryClient); tests pass their own. */
  queryClient: QueryClient;
  children: ReactNode;
}

/** Everything the routes need from above them. */
export function Providers({ queryClient, children }: ProvidersProps) {
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}
