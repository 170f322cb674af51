import { render, type RenderResult } from '@testing-library/react';
import type { QueryClient } from '@tanstack/react-query';
import type { ReactElement } from 'react';
import { MemoryRouter } from 'react-router-dom';
import { AppProviders } from '../app/providers';
import { createQueryClient } from '../lib/query-client';

/** Renders inside the app's providers (theme, a fresh query cache) and a memory router. */
export function renderWithProviders(ui: ReactElement, queryClient: QueryClient = createQueryClient()): RenderResult & { queryClient: QueryClient } {
  const result = render(
    <AppProviders queryClient={queryClient}>
      <MemoryRouter>{ui}</MemoryRouter>
    </AppProviders>,
  );
  return { ...result, queryClient };
}

/** A JSON Response as the service sends it. */
export function jsonResponse(status: number, body: unknown): Response {
  return new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
}
