import { readdir, readFile, unlink } from 'node:fs/promises';
import { join } from 'node:path';
import { Injectable, Logger, NotFoundException } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AllConfigType } from '../config/config.type';

/** A kept message in the outbox list. */
export interface OutboxEntry {
  id: string;
  /** ISO 8601, UTC. */
  receivedAt: string;
  from: string;
  /** Every address the message was delivered to. */
  to: string[];
  subject: string;
}

/** One kept message with its bodies. */
export interface OutboxMessage extends OutboxEntry {
  text: string;
  html: string;
}

/** Ids are what the fake SMTP server writes: letters, digits, dashes. Anything else is unknown. */
const idPattern = /^[A-Za-z0-9-]{1,64}$/;

/**
 * Reads the folder the fake SMTP server keeps messages in (`mail.outboxDir`): each message is a
 * `<timestamp>-<id>.eml` file with a `.json` sidecar. For development and tests only.
 */
@Injectable()
export class OutboxService {
  private readonly logger = new Logger(OutboxService.name);
  private readonly dir: string;

  constructor(configService: ConfigService<AllConfigType>) {
    this.dir = configService.getOrThrow('mail.outboxDir', { infer: true });
  }

  /** Every kept message, newest first. An outbox folder that does not exist yet is empty. */
  async findAll(): Promise<OutboxEntry[]> {
    const messages = await this.readAll();
    return messages.map(({ id, receivedAt, from, to, subject }) => ({
      id,
      receivedAt,
      from,
      to,
      subject,
    }));
  }

  /**
   * One kept message with its text and HTML.
   * @throws NotFoundException when no message has this id
   */
  async findOne(id: string): Promise<OutboxMessage> {
    const name = idPattern.test(id)
      ? (await this.sidecarNames()).find((file) => file.endsWith(`-${id}.json`))
      : undefined;
    const message = name ? await this.readSidecar(name) : undefined;
    if (!message) throw new NotFoundException('There is no message with this id in the outbox.');
    return message;
  }

  /** Deletes every kept message (the `.eml` files and their sidecars); other files stay. */
  async removeAll(): Promise<{ removed: number }> {
    const names = await this.fileNames();
    const sidecars = names.filter((name) => name.endsWith('.json'));
    const kept = names.filter((name) => name.endsWith('.json') || name.endsWith('.eml'));
    await Promise.all(kept.map((name) => unlink(join(this.dir, name)).catch(ignoreMissing)));
    return { removed: sidecars.length };
  }

  private async readAll(): Promise<OutboxMessage[]> {
    const messages = await Promise.all(
      (await this.sidecarNames()).map((name) => this.readSidecar(name)),
    );
    return messages
      .filter((message): message is OutboxMessage => message !== undefined)
      .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt) || b.id.localeCompare(a.id));
  }

  private async sidecarNames(): Promise<string[]> {
    return (await this.fileNames()).filter((name) => name.endsWith('.json'));
  }

  private async fileNames(): Promise<string[]> {
    try {
      return await readdir(this.dir);
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return [];
      throw error;
    }
  }

  /** A sidecar as a message, or `undefined` (logged) when it was removed or cannot be read. */
  private async readSidecar(name: string): Promise<OutboxMessage | undefined> {
    try {
      const record = JSON.parse(
        await readFile(join(this.dir, name), 'utf8'),
      ) as Partial<OutboxMessage>;
      return {
        id: String(record.id),
        receivedAt: String(record.receivedAt),
        from: record.from ?? '',
        to: Array.isArray(record.to) ? record.to : [],
        subject: record.subject ?? '',
        text: record.text ?? '',
        html: record.html ?? '',
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'ENOENT') {
        this.logger.warn(
          `Skipped the unreadable outbox file ${join(this.dir, name)}: ${(error as Error).message}`,
        );
      }
      return undefined;
    }
  }
}

function ignoreMissing(error: NodeJS.ErrnoException): void {
  if (error.code !== 'ENOENT') throw error;
}
