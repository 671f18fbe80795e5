export * from './colour.js';
