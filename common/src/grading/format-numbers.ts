/** Formats a number with one decimal, for the numbers of feedback lines (true minus sign). */
export const fixed1 = (v: number): string => v.toFixed(1).replace('-', '−');

/** Formats a number with two decimals (true minus sign). */
export const fixed2 = (v: number): string => v.toFixed(2).replace('-', '−');

/** Formats a signed difference with one decimal: "+7.1", "−2.0" (true minus sign). */
export const signed1 = (v: number): string => {
  const text = Math.abs(v).toFixed(1);
  if (text === '0.0') return '0.0';
  return v > 0 ? `+${text}` : `−${text}`;
};

/** "swatch 3" for index 2: people count from one. */
export const swatchName = (index: number): string => `swatch ${index + 1}`;

/** Capitalises the first letter of a sentence. */
export const sentence = (text: string): string => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * Prefixes a sentence with the swatch it is about when a drill has several:
 * "Swatch 2: too light …"; with one swatch the sentence stands alone.
 */
export const aboutSwatch = (text: string, index: number, several: boolean): string =>
  several
    ? `${sentence(swatchName(index))}: ${text.charAt(0).toLowerCase()}${text.slice(1)}`
    : sentence(text);
