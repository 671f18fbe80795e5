/** The paper a reference card's PDF is laid out for (the server takes `A4` or `letter`). */
export type CardPaper = 'A4' | 'letter';

export const paperWords: Record<CardPaper, string> = { A4: 'A4', letter: 'US Letter' };

/** Letter where it is the usual paper (the Americas' letter countries), A4 elsewhere. */
export function defaultPaper(): CardPaper {
  const region = typeof navigator === 'undefined' ? '' : (navigator.language.split('-')[1] ?? '');
  return ['US', 'CA', 'MX', 'PH', 'CL', 'CO', 'VE'].includes(region.toUpperCase())
    ? 'letter'
    : 'A4';
}

/** The local paper first, the other one after it. */
export const papersInOrder = (): CardPaper[] =>
  defaultPaper() === 'letter' ? ['letter', 'A4'] : ['A4', 'letter'];
