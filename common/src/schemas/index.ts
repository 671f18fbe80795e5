export * from './validation-details.js';
export * from './health.schema.js';
