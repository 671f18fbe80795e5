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
    expect(lines[1]).toBe('Ada Quill,ada@studio.test,91,passed');
    expect(lines[2]).toBe(`"'=HYPERLINK(""x"")",eve@studio.test,,`);
  });
});
