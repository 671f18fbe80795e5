import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { describe, expect, it } from 'vitest';
import { renderApp } from '@/testing/test-utils';
import { parsePigmentCodes } from './parse-pigment-codes';
import { PigmentsField } from './pigments-field';

describe('parsePigmentCodes', () => {
  it.each([
    ['PR 209', ['PR209']],
    ['pr209', ['PR209']],
    ['PR209, PB29', ['PR209', 'PB29']],
    ['pr 209 pb 29', ['PR209', 'PB29']],
    ['PB 15:3; PBk 9', ['PB15:3', 'PBK9']],
    ['PY35,PW6', ['PY35', 'PW6']],
    ['  ', []],
  ])('should read %j as %j', (typed, codes) => {
    expect(parsePigmentCodes(typed)).toEqual(codes);
  });

  it('should keep what is not a code, for the schema to flag', () => {
    expect(parsePigmentCodes('PR 209, cadmium')).toEqual(['PR209', 'CADMIUM']);
  });
});

function Harness() {
  const [codes, setCodes] = useState<string[]>([]);
  return (
    <>
      <PigmentsField label="Pigments" value={codes} onChange={setCodes} />
      <output aria-label="Codes">{codes.join('|')}</output>
    </>
  );
}

describe('PigmentsField', () => {
  it('should hand the form normalised codes while keeping the text as typed', async () => {
    renderApp(<Harness />);
    await userEvent.type(screen.getByLabelText('Pigments'), 'PR 209, pb29');
    expect(screen.getByLabelText('Codes')).toHaveTextContent('PR209|PB29');
    expect(screen.getByLabelText('Pigments')).toHaveValue('PR 209, pb29');
  });
});
