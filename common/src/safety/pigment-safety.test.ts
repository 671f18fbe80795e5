import { describe, expect, it } from 'vitest';
import { pigmentCautions, pigmentSafety, pigmentSafetyNotes } from './pigment-safety.js';

describe('pigmentSafety', () => {
  it('should flag cadmium and cobalt pigments and pass over ultramarine (PB29) and quinacridone (PV19)', () => {
    const notes = pigmentSafety(['PB29', 'pr 108', 'PV19', 'PB28', 'PR108']);
    expect(notes.map((n) => [n.code, n.elements])).toEqual([
      ['PR108', ['cadmium']],
      ['PB28', ['cobalt']],
    ]);
  });

  it('should mark every entry with its source, as the project rules ask', () => {
    for (const note of pigmentSafetyNotes) expect(note.source).toBe('common practice (from memory; check the label)');
    expect(new Set(pigmentSafetyNotes.map((n) => n.code)).size).toBe(pigmentSafetyNotes.length);
  });

  it('should give the usual cautions, ending with the label and local rules', () => {
    expect(pigmentCautions.join(' ')).toMatch(/mouth/);
    expect(pigmentCautions.at(-1)).toMatch(/label.*local rules/);
  });
});
