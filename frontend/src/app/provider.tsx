import CssBaseline from '@mui/material/CssBaseline';
import ThemeProvider from '@mui/system/ThemeProvider';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { Component, useEffect, useState, type ReactNode } from 'react';
import { MainErrorFallback } from '@/components/errors/main-error-fallback';
import { authStore } from '@/lib/auth-store';
import { createQueryClient } from '@/lib/react-query';
import { theme } from '@/theme/theme';

class RootErrorBoundary extends Component<{ children: ReactNode }, { error?: Error }> {
  override state: { error?: Error } = {};
  static getDerivedStateFromError(error: Error) {
    return { error };
  }
  override render() {
    return this.state.error ? <MainErrorFallback message={`${this.state.error.message}.`} /> : this.props.children;
  }
}

/**
 * When a session ends (signed out, or a refresh that failed), nothing of it stays in the cache
 * for the next person at this browser.
 */
function useForgetOnSignOut(client: QueryClient) {
  useEffect(() => {
    let was = authStore.get().status;
    const unsubscribe = authStore.subscribe(() => {
      const now = authStore.get().status;
      if (was === 'signed-in' && now === 'signed-out') client.clear();
      was = now;
    });
    return () => {
      unsubscribe();
    };
  }, [client]);
}

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  useForgetOnSignOut(client);
  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <RootErrorBoundary>
        <QueryClientProvider client={client}>{children}</QueryClientProvider>
      </RootErrorBoundary>
    </ThemeProvider>
  );
}
