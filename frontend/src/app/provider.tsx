import CssBaseline from '@mui/material/CssBaseline';
import { ThemeProvider } from '@mui/material/styles';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import { Component, useState, type ReactNode } from 'react';
import { MainErrorFallback } from '@/components/errors/main-error-fallback';
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

export function AppProvider({ children, queryClient }: { children: ReactNode; queryClient?: QueryClient }) {
  const [client] = useState(() => queryClient ?? createQueryClient());
  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <RootErrorBoundary>
        <QueryClientProvider client={client}>{children}</QueryClientProvider>
      </RootErrorBoundary>
    </ThemeProvider>
  );
}
