import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { AxiosHeaders } from 'axios';
import { describe, expect, it, vi } from 'vitest';
import { api } from '@/lib/api-client';
import { renderApp } from '@/testing/test-utils';
import type { Gradebook } from '../types';
import { GradebookTable } from './gradebook-table';

const book: Gradebook = {
  classId: 'c1',
  className: 'Thursday watercolour',
  assignments: [
    { id: 'a1', drillTitle: 'Warm grey', kind: 'neutral', dueAt: '2026-03-12T18:00:00.000Z' },
    { id: 'a2', drillTitle: 'Five-step ladder', kind: 'value-ladder', dueAt: '2026-03-19T18:00:00.000Z' },
  ],
  students: [
    {
      id: 's1',
      displayName: 'Pip Lindqvist',
      email: 'pip@example.test',
      cells: {
        a1: { status: 'passed', attempts: 2, latestScore: 88, bestScore: 88, latestAttemptId: 't1' },
        a2: { status: 'failed', attempts: 1, latestScore: 40, bestScore: 40, latestAttemptId: 't2' },
      },
    },
    {
      id: 's2',
      displayName: 'Arlo Brenneck',
      email: 'arlo@example.test',
      cells: { a1: { status: 'failed', attempts: 1, latestScore: 52, bestScore: 52, latestAttemptId: 't3' } },
    },
    { id: 's3', displayName: 'Cosima Veld', email: 'cosima@example.test', cells: {} },
  ],
};

const names = () =>
  within(screen.getByRole('table'))
    .getAllByRole('rowheader')
    .map((cell) => within(cell).getAllByText(/\w/)[0].textContent);

describe('GradebookTable', () => {
  it('should sort by student and by an assignment’s best score, unscored last', async () => {
    renderApp(<GradebookTable book={book} />);
    expect(names()).toEqual(['Arlo Brenneck', 'Cosima Veld', 'Pip Lindqvist']);
    await userEvent.click(screen.getByRole('button', { name: 'Student' }));
    expect(names()).toEqual(['Pip Lindqvist', 'Cosima Veld', 'Arlo Brenneck']);
    await userEvent.click(screen.getByRole('button', { name: 'Sort by best score in Warm grey' }));
    expect(names()).toEqual(['Pip Lindqvist', 'Arlo Brenneck', 'Cosima Veld']);
    await userEvent.click(screen.getByRole('button', { name: 'Sort by best score in Warm grey' }));
    expect(names()).toEqual(['Arlo Brenneck', 'Pip Lindqvist', 'Cosima Veld']);
  });

  it('should show score and status in words and link to the latest attempt', () => {
    renderApp(<GradebookTable book={book} />);
    const link = screen.getByRole('link', { name: /Pip Lindqvist, Warm grey: best 88, Passed/ });
    expect(link).toHaveAttribute('href', '/attempts/t1');
    expect(screen.getAllByText('Not started')).toHaveLength(3);
  });

  it('should filter by name and by status', async () => {
    renderApp(<GradebookTable book={book} />);
    await userEvent.type(screen.getByLabelText('Filter by name or e-mail'), 'arlo');
    expect(names()).toEqual(['Arlo Brenneck']);
    await userEvent.clear(screen.getByLabelText('Filter by name or e-mail'));
    await userEvent.click(screen.getByRole('combobox', { name: 'Status in any assignment' }));
    await userEvent.click(within(screen.getByRole('listbox')).getByRole('option', { name: 'Passed' }));
    expect(names()).toEqual(['Pip Lindqvist']);
    expect(screen.getByText('1 of 3 students match')).toBeInTheDocument();
  });

  it('should page a 30-student class, sorting and filtering the whole class, not just the page', async () => {
    const first = ['Ada', 'Bea', 'Cai', 'Dov', 'Eli', 'Fen'];
    const last = ['Marsh', 'Tallow', 'Umber', 'Wren', 'Yarrow'];
    const students = first.flatMap((f, i) =>
      last.map((l, j) => ({
        id: `s${i}-${j}`,
        displayName: `${f} ${l}`,
        email: `${f}.${l}@example.test`.toLowerCase(),
        // Scores rise through the class, so the best scores sit on the last page by name.
        cells: { a1: { status: 'passed' as const, attempts: 1, latestScore: 40 + i * 5 + j, bestScore: 40 + i * 5 + j, latestAttemptId: `t${i}-${j}` } },
      })),
    );
    renderApp(<GradebookTable book={{ ...book, students }} />);
    expect(names()).toHaveLength(25);
    expect(screen.getByText('Students 1–25 of 30')).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Go to the next page of students' }));
    expect(names()).toEqual(['Fen Marsh', 'Fen Tallow', 'Fen Umber', 'Fen Wren', 'Fen Yarrow']);
    // Sorting by score takes the whole class and starts again at the first page.
    await userEvent.click(screen.getByRole('button', { name: 'Sort by best score in Warm grey' }));
    expect(names()[0]).toBe('Fen Yarrow');
    expect(screen.getByText('Students 1–25 of 30')).toBeInTheDocument();
    // A filter finds a student who was not on the page shown.
    await userEvent.type(screen.getByLabelText('Filter by name or e-mail'), 'ada');
    expect(names()).toEqual(['Ada Marsh', 'Ada Tallow', 'Ada Umber', 'Ada Wren', 'Ada Yarrow'].reverse());
    expect(screen.queryByText(/Students \d+–\d+ of/)).not.toBeInTheDocument();
  });

  it('should fetch the CSV through the API client and save it under the server’s name', async () => {
    // jsdom's XHR cannot hand MSW a blob body, so the client call itself is stubbed here;
    // the Bearer header comes from the client's interceptor (see lib/api-client.ts).
    const get = vi.spyOn(api, 'get').mockResolvedValue({
      data: new Blob(['Student,E-mail\r\n'], { type: 'text/csv' }),
      status: 200,
      statusText: 'OK',
      headers: { 'content-disposition': 'attachment; filename="gradebook-Thursday.csv"' },
      config: { headers: new AxiosHeaders() },
    });
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:gradebook'), revokeObjectURL: vi.fn() });
    let savedAs = '';
    const click = vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      savedAs = this.download;
    });
    renderApp(<GradebookTable book={book} />);
    await userEvent.click(screen.getByRole('button', { name: 'Download CSV' }));
    await waitFor(() => expect(savedAs).toBe('gradebook-Thursday.csv'));
    expect(get).toHaveBeenCalledWith('/classes/c1/gradebook.csv', { responseType: 'blob' });
    click.mockRestore();
    get.mockRestore();
  });
});
