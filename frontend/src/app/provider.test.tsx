import { QueryClient } from '@tanstack/react-query';
import { act, render } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { authStore } from '@/lib/auth-store';
import { signInAs } from '@/testing/test-utils';
import { AppProvider } from './provider';

describe('AppProvider', () => {
  it('should forget the cached data when the session ends', () => {
    signInAs('student');
    const queryClient = new QueryClient();
    queryClient.setQueryData(['classes', 'list'], [{ id: 'c1' }]);
    render(
      <AppProvider queryClient={queryClient}>
        <p>page</p>
      </AppProvider>,
    );
    expect(queryClient.getQueryData(['classes', 'list'])).toEqual([{ id: 'c1' }]);
    act(() => authStore.signOut());
    expect(queryClient.getQueryData(['classes', 'list'])).toBeUndefined();
  });
});
