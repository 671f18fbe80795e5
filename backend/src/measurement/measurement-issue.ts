/** Stable identifiers of what can go wrong with a photo; the app translates them. */
export type MeasurementErrorCode =
  | 'FILE_UNREADABLE'
  | 'FILE_UNSUPPORTED'
  | 'FILE_TOO_LARGE'
  | 'CARD_NOT_FOUND'
  | 'CARD_PARTLY_OUTSIDE'
  | 'CARD_COVERED'
  | 'GLARE'
  | 'TOO_DARK'
  | 'TOO_BRIGHT'
  | 'BLURRED'
  | 'UNEVEN_LIGHT'
  | 'WINDOW_NOT_PAINTED';

/** One error or warning: a code and a sentence a student can act on. */
export type MeasurementIssue = {
  code: MeasurementErrorCode;
  message: string;
  /** Index of the window concerned, when there is one. */
  window?: number;
};

/** Codes about the file itself: the CLI exits 2 for these (1 for the others). */
export const fileErrorCodes: ReadonlySet<MeasurementErrorCode> = new Set([
  'FILE_UNREADABLE',
  'FILE_UNSUPPORTED',
  'FILE_TOO_LARGE',
]);

/** Thrown by the decoder for a file that cannot be used at all. */
export class PhotoFileError extends Error {
  constructor(
    readonly code: 'FILE_UNREADABLE' | 'FILE_UNSUPPORTED' | 'FILE_TOO_LARGE',
    message: string,
  ) {
    super(message);
    this.name = 'PhotoFileError';
  }
}
