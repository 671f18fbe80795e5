/** Mixmark's grading rules: one pure function per drill kind, and what they share. */
export * from './score-curve.js';
export * from './tolerance-bands.js';
export { words as painterWords, castRemedy } from './painter-words.js';
export { colourFeedback, noticeTerm } from './target-feedback.js';
export type { ColourFeedbackScope } from './target-feedback.js';
export { markTarget, lightnessTerm } from './mark-target.js';
export { fitQuadratic } from './fit-quadratic.js';
export * from './grade-match.js';
export * from './grade-value-ladder.js';
export * from './grade-temperature-pair.js';
export * from './grade-neutral.js';
export * from './grade-graded-wash.js';
export * from './grade-flat-wash.js';
export * from './grade-attempt.js';
export * from './assignment-status-label.js';
