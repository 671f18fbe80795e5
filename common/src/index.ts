/**
 * @mixmark/common: the only public entry. Pure, I/O-free code that both the server and the
 * browser use: colour maths, grading rules, shared types and the yup schemas.
 */
export * from './colour/index.js';
export * from './grading/index.js';
export * from './types/index.js';
export * from './types/api-error.js';
export * from './schemas/index.js';
export * from './safety/pigment-safety.js';
