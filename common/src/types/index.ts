export * from './colour.js';
export * from './drill.js';
export * from './reading.js';
export * from './mark.js';
export * from './grade-input.js';
export * from './attempt-view.js';
export * from './progress.js';
