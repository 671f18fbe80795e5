import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { attemptReply } from '@/testing/mocks/fixtures';
import { renderApp, signInAs } from '@/testing/test-utils';
import type { Attempt } from '../types';
import { AttemptResult } from './attempt-result';

const attempt = (overrides: Record<string, unknown> = {}) =>
  attemptReply(overrides) as unknown as Attempt;

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
          quality: {
            errors: [{ code: 'CARD_NOT_FOUND', message: 'The reference card was not found.' }],
            warnings: [],
          },
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

  // The override replaces the machine's score and pass in `score`/`pass` (backend attempt-view.ts);
  // the machine's own stays in `machine`. Invented demo numbers.
  const overridden = (overrides: Record<string, unknown> = {}) =>
    attempt({
      score: 55,
      pass: false,
      machine: { score: 92, pass: true },
      override: {
        score: 55,
        pass: false,
        comment: 'The colour is near, but the wash dried with a hard edge.\nKeep the bead moving.',
        by: '44444444-4444-4444-8444-444444444444',
        at: '2025-03-11T09:30:00.000Z',
      },
      ...overrides,
    });

  it("should show the teacher's mark first, as the one that stands, with their comment, who and when", () => {
    signInAs('student');
    renderApp(<AttemptResult attempt={overridden()} markedBy="Tamsin Arvello" />);
    const teacher = screen.getByRole('region', { name: "The teacher's mark" });
    const machine = screen.getByRole('region', { name: 'What the machine measured' });
    // Teacher's section before the machine's in document order.
    expect(
      teacher.compareDocumentPosition(machine) & Node.DOCUMENT_POSITION_FOLLOWING,
    ).toBeTruthy();
    expect(within(teacher).getByText('Not yet · 55/100')).toBeInTheDocument();
    expect(within(teacher).getByText('This is the mark that stands.')).toBeInTheDocument();
    const comment = within(teacher).getByRole('blockquote', { name: "The teacher's comment" });
    expect(comment.textContent).toBe(
      'The colour is near, but the wash dried with a hard edge.\nKeep the bead moving.',
    );
    const when = new Date('2025-03-11T09:30:00.000Z').toLocaleString(undefined, {
      dateStyle: 'medium',
      timeStyle: 'short',
    });
    expect(within(teacher).getByText(`Marked by Tamsin Arvello on ${when}.`)).toBeInTheDocument();
    // The machine's mark is below, in words and with its ΔE00 (2.3 in the fixture), not as a second badge.
    expect(
      within(machine).getByText(/^The machine measured ΔE00 2\.3 and marked it Pass · 92\/100\./),
    ).toBeInTheDocument();
    expect(within(machine).queryByText('Pass · 92/100')).not.toBeInTheDocument();
    expect(screen.getAllByText(/· \d+\/100$/)).toHaveLength(1);
    expect(
      within(machine).getByRole('heading', { name: "The machine's advice" }),
    ).toBeInTheDocument();
    expect(within(machine).getByText('A touch light: a little less water.')).toBeInTheDocument();
    expect(
      within(machine).getByRole('table', { name: 'Parts of the colour difference' }),
    ).toHaveTextContent('ΔE002.3');
  });

  it('should say when the teacher left no comment, and name "the teacher" when not told who', () => {
    signInAs('student');
    const plain = overridden();
    renderApp(
      <AttemptResult attempt={{ ...plain, override: { ...plain.override!, comment: '' } }} />,
    );
    const teacher = screen.getByRole('region', { name: "The teacher's mark" });
    expect(within(teacher).getByText('No comment was left with this mark.')).toBeInTheDocument();
    expect(within(teacher).getByText(/^Marked by the teacher on /)).toBeInTheDocument();
  });

  it('should give the range of ΔE00 for a drill with several targets', () => {
    signInAs('student');
    const [first] = attempt().mark!.targets;
    const mark = {
      ...attempt().mark!,
      targets: [first, { ...first, index: 1, deltaE: 4.26 }, { ...first, index: 2, deltaE: 0.81 }],
    };
    renderApp(<AttemptResult attempt={overridden({ mark })} />);
    expect(
      screen.getByText(
        /^The machine measured ΔE00 from 0\.8 to 4\.3 across its 3 swatches and marked it Pass · 92\/100\./,
      ),
    ).toBeInTheDocument();
  });

  it("should show the teacher's mark on a photo the machine could not measure", () => {
    signInAs('student');
    renderApp(
      <AttemptResult
        onRetry={vi.fn()}
        attempt={overridden({
          state: 'needs-retake',
          mark: null,
          machine: null,
          quality: {
            errors: [{ code: 'GLARE', message: 'Glare covers part of the window.' }],
            warnings: [],
          },
        })}
      />,
    );
    const teacher = screen.getByRole('region', { name: "The teacher's mark" });
    expect(within(teacher).getByText('Not yet · 55/100')).toBeInTheDocument();
    const machine = screen.getByRole('region', { name: 'What the machine measured' });
    expect(
      within(machine).getByText(
        /^The machine could not measure this photo, so it gave no mark of its own\./,
      ),
    ).toBeInTheDocument();
    expect(within(machine).getByText('Glare covers part of the window.')).toBeInTheDocument();
  });

  it('should look as before without an override: the machine mark leads, no teacher or machine sections', () => {
    signInAs('student');
    renderApp(<AttemptResult attempt={attempt()} markedBy="Tamsin Arvello" />);
    expect(screen.queryByRole('region', { name: "The teacher's mark" })).not.toBeInTheDocument();
    expect(
      screen.queryByRole('region', { name: 'What the machine measured' }),
    ).not.toBeInTheDocument();
    expect(screen.queryByText(/Marked by/)).not.toBeInTheDocument();
    expect(screen.getByText('Pass · 92/100')).toBeInTheDocument();
    expect(screen.getByRole('heading', { level: 2, name: 'What to change' })).toBeInTheDocument();
  });
});
