import { object, string, number, boolean, type InferType } from 'yup';

/** What `GET /api/health` answers; the app reads it through the same schema. */
export const healthSchema = object({
  status: string().oneOf(['ok', 'degraded']).required(),
  version: string().required(),
  uptimeSeconds: number().required(),
  database: object({
    up: boolean().required(),
    latencyMs: number().nullable().defined(),
    serverVersion: string().nullable().defined(),
    migrationsPending: number().nullable().defined(),
  }).required(),
});

export type Health = InferType<typeof healthSchema>;
