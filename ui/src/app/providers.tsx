import { Theme } from '@radix-ui/themes';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';

export interface AppProvidersProps {
  queryClient: QueryClient;
  children: ReactNode;
}

/** Theme (Poreline's jade-on-sage look) and the query cache around the whole app. */
export function AppProviders({ queryClient, children }: AppProvidersProps) {
  return (
    <Theme accentColor="jade" grayColor="sage" radius="medium" scaling="100%" panelBackground="solid">
      <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
    </Theme>
  );
}
