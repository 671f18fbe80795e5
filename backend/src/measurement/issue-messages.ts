import type { MeasurementErrorCode, MeasurementIssue } from './measurement-issue';

/** The sentence for each code: what went wrong and what to do about it. */
const messages: Record<MeasurementErrorCode, string> = {
  FILE_UNREADABLE: 'This file is not a photo we can read. Send the photo as a JPEG.',
  FILE_UNSUPPORTED: 'This kind of file is not supported. Send the photo as a JPEG.',
  FILE_TOO_LARGE: 'This file is too large. Send the photo straight from the phone camera.',
  CARD_NOT_FOUND:
    'The reference card was not found. Make sure the whole printed card is in the photo, flat, in focus and with its four corner codes visible.',
  CARD_PARTLY_OUTSIDE:
    'Part of the card is outside the photo. Step back a little so the whole card, with all four corner codes, is in the frame.',
  CARD_COVERED:
    'Part of the card is covered or in deep shadow. Move fingers, brushes and shadows off the card, so all four corner codes show.',
  GLARE:
    'There is glare or a reflection on the card or the swatch. Tilt the card slightly or move away from the lamp or window reflection, and avoid the flash.',
  TOO_DARK:
    'The photo is too dark. Take it in brighter light (near a window by day is best), without flash.',
  TOO_BRIGHT:
    'The photo is overexposed: the white card has washed out. Move out of direct sun or tap the card on the screen to set the exposure.',
  BLURRED: 'The photo is blurred. Hold the phone still, tap the card to focus, and take it again.',
  UNEVEN_LIGHT:
    'The light is uneven across the card (a shadow or a lamp to one side). Light the card evenly, for example facing a window, and keep your own shadow off it.',
  WINDOW_NOT_PAINTED:
    'A window shows bare paper. Put the painted swatch right under the window (dry), or check that the card is the one for this drill.',
};

/**
 * An error or warning with its standard sentence, optionally followed by a detail.
 *
 * @param code - the stable code
 * @param detail - an extra sentence (e.g. which window, a measured figure)
 * @param window - window index, when it concerns one
 * @returns the issue
 */
export function issue(
  code: MeasurementErrorCode,
  detail?: string,
  window?: number,
): MeasurementIssue {
  const message = detail ? `${messages[code]} ${detail}` : messages[code];
  return window === undefined ? { code, message } : { code, message, window };
}
