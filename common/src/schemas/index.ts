export * from './validation-details.js';
export * from './health.schema.js';
export * from './auth.schema.js';
export * from './class.schema.js';
export * from './drill.schema.js';
export * from './assignment.schema.js';
export * from './attempt.schema.js';
export * from './paint.schema.js';
