import { describe, expect, it } from 'vitest';
import { readEnv } from './env';

describe('readEnv', () => {
  it('should default the API to /api on the same origin', () => {
    expect(readEnv({})).toEqual({ VITE_APP_API_URL: '/api' });
  });

  it('should take a path or an http(s) address', () => {
    expect(readEnv({ VITE_APP_API_URL: 'https://api.mixmark.test' }).VITE_APP_API_URL).toBe(
      'https://api.mixmark.test',
    );
  });

  it('should list what is wrong in words', () => {
    expect(() => readEnv({ VITE_APP_API_URL: 'api.mixmark.test' })).toThrow(
      'Invalid app settings:\n  - VITE_APP_API_URL must be a path (/api) or an http(s) address',
    );
  });
});
