import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { attemptReply } from '@/testing/mocks/fixtures';
import { renderApp, signInAs } from '@/testing/test-utils';
import type { Attempt } from '../types';
import { AttemptResult } from './attempt-result';

const attempt = (overrides: Record<string, unknown> = {}) => attemptReply(overrides) as unknown as Attempt;

describe('AttemptResult', () => {
  it('should say pass in words with the score, not by colour alone', () => {
    signInAs('student');
    renderApp(<AttemptResult attempt={attempt()} />);
    expect(screen.getByText('Pass · 92/100')).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /^Target: L\* 52\.0/ })).toBeInTheDocument();
    expect(screen.getByRole('img', { name: /^Your swatch: L\* 54\.1/ })).toBeInTheDocument();
    expect(screen.getByText('too light')).toBeInTheDocument();
    expect(screen.getByText('too grey')).toBeInTheDocument();
    expect(screen.getByText('A touch light: a little less water.')).toBeInTheDocument();
    expect(screen.getByText('L* 54.1 vs 52.0 target (ΔL′ +2.1)')).toBeInTheDocument();
  });

  it('should say "not yet" for a failed mark', () => {
    signInAs('student');
    renderApp(<AttemptResult attempt={attempt({ pass: false, score: 41 })} />);
    expect(screen.getByText('Not yet · 41/100')).toBeInTheDocument();
  });

  it('should show the same value in greyscale on request', async () => {
    signInAs('student');
    renderApp(<AttemptResult attempt={attempt()} />);
    await userEvent.click(screen.getByLabelText('Value only (greyscale)'));
    expect(screen.getByLabelText('Value only (greyscale)')).toBeChecked();
  });

  it('should list what to fix in the photo when it needs a retake, with a retake button', async () => {
    signInAs('student');
    const onRetry = vi.fn();
    renderApp(
      <AttemptResult
        onRetry={onRetry}
        attempt={attempt({
          state: 'needs-retake',
          mark: null,
          score: null,
          pass: null,
          quality: { errors: [{ code: 'CARD_NOT_FOUND', message: 'The reference card was not found.' }], warnings: [] },
        })}
      />,
    );
    expect(screen.getByText('The photo could not be measured')).toBeInTheDocument();
    expect(screen.getByText('The reference card was not found.')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Retake' }));
    expect(onRetry).toHaveBeenCalled();
  });

  it('should show live status while the photo is measured', () => {
    signInAs('student');
    renderApp(<AttemptResult attempt={attempt({ state: 'measuring', mark: null })} />);
    expect(screen.getByRole('status')).toHaveTextContent(/measuring your swatch/);
  });
});
