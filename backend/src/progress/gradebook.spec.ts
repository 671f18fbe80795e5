import { describe, expect, it } from '@jest/globals';
import { gradebookCsv, type Gradebook } from './gradebook';

describe('gradebookCsv', () => {
  const book: Gradebook = {
    classId: 'c',
    className: 'Tuesdays',
    assignments: [{ id: 'a1', drillTitle: 'Greys, "warm" and cool', kind: 'neutral', dueAt: new Date('2026-12-08T18:00:00Z') }],
    students: [
      { id: 's1', displayName: 'Ada Quill', email: 'ada@studio.test', cells: { a1: { status: 'passed', attempts: 2, latestScore: 88, bestScore: 91, latestAttemptId: 'x' } } },
      { id: 's2', displayName: '=HYPERLINK("x")', email: 'eve@studio.test', cells: {} },
    ],
  };

  it('should quote fields with commas and quotes as RFC 4180 says', () => {
    const [header] = gradebookCsv(book).split('\r\n');
    expect(header).toBe('Student,E-mail,"Greys, ""warm"" and cool (due 2026-12-08) best","Greys, ""warm"" and cool status"');
  });

  it('should write one row per student and defuse spreadsheet formulas', () => {
    const lines = gradebookCsv(book).trimEnd().split('\r\n');
    expect(lines[1]).toBe('Ada Quill,ada@studio.test,91,Passed');
    expect(lines[2]).toBe(`"'=HYPERLINK(""x"")",eve@studio.test,,Not started`);
  });

  it('should write each status in the words the screen uses', () => {
    const statuses = ['not-started', 'submitted', 'needs-retake', 'passed', 'failed', 'late'] as const;
    const many: Gradebook = {
      ...book,
      students: statuses.map((status, i) => ({ id: `s${i}`, displayName: `Student ${i}`, email: `s${i}@studio.test`, cells: { a1: { status, attempts: 1, latestScore: null, bestScore: null, latestAttemptId: null } } })),
    };
    const column = gradebookCsv(many).trimEnd().split('\r\n').slice(1).map((line) => line.split(',').at(-1));
    expect(column).toEqual(['Not started', 'Being measured', 'Retake the photo', 'Passed', 'Not passed yet', 'Late']);
  });
});
