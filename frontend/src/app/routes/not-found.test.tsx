import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '@/testing/test-utils';
import NotFoundRoute from './not-found';

describe('NotFoundRoute', () => {
  it('should say the page is missing and link back to the start', () => {
    renderApp(<NotFoundRoute />, { route: '/no/such/page' });
    expect(screen.getByRole('heading', { name: 'Page not found' })).toBeInTheDocument();
    expect(screen.getByRole('link', { name: 'Go to the start page' })).toHaveAttribute('href', '/');
  });
});
