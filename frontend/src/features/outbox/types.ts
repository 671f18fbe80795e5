/** One kept e-mail as `GET /api/dev/outbox` lists it (newest first). */
export type OutboxEntry = {
  id: string;
  /** ISO 8601, UTC. */
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
};

/** One kept e-mail with its bodies, as `GET /api/dev/outbox/:id` answers it. */
export type OutboxMessage = OutboxEntry & { text: string; html: string };
