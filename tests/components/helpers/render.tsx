import type { ReactElement } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react-native';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { authKeys } from '@/lib/api/auth';
import type { User } from '@/shared/api/auth';

/** gcTime Infinity and no retries: otherwise jest waits on react-query's timers (DEVELOPERS.md). */
export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false, gcTime: Infinity } },
  });
}

const safeArea = { frame: { x: 0, y: 0, width: 390, height: 844 }, insets: { top: 0, left: 0, right: 0, bottom: 0 } };

export function renderWithClient(ui: ReactElement, { user, client = createTestQueryClient() }: { user?: User | null; client?: QueryClient } = {}) {
  if (user !== undefined) client.setQueryData(authKeys.me(), user);
  const result = render(
    <SafeAreaProvider initialMetrics={safeArea}>
      <QueryClientProvider client={client}>{ui}</QueryClientProvider>
    </SafeAreaProvider>,
  );
  return { ...result, client };
}

export const demoUsers = {
  admin: { id: 1, email: 'maya@tidewater.example', name: 'Maya Okafor', role: 'admin', teamId: 1 },
  designer: { id: 2, email: 'ravi@tidewater.example', name: 'Ravi Menon', role: 'designer', teamId: 1 },
  installer: { id: 4, email: 'ines@tidewater.example', name: 'Ines Duarte', role: 'installer', teamId: 1 },
} satisfies Record<string, User>;
