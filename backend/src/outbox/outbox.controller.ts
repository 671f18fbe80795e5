import { Controller, Delete, Get, HttpCode, HttpStatus, Param } from '@nestjs/common';
import { Public } from '../common/decorators/public.decorator';
import { OutboxService, type OutboxEntry, type OutboxMessage } from './outbox.service';

/**
 * The fake SMTP server's messages over HTTP, for the development outbox page and for tests.
 * Registered only outside production (see `OutboxModule.register`).
 */
@Controller('dev/outbox')
export class OutboxController {
  constructor(private readonly outboxService: OutboxService) {}

  /** Every kept message, newest first: id, receivedAt, from, to, subject. */
  @Public()
  @Get()
  findAll(): Promise<OutboxEntry[]> {
    return this.outboxService.findAll();
  }

  /** One message with its text and HTML; 404 for an unknown id. */
  @Public()
  @Get(':id')
  findOne(@Param('id') id: string): Promise<OutboxMessage> {
    return this.outboxService.findOne(id);
  }

  /** Empties the outbox. */
  @Public()
  @Delete()
  @HttpCode(HttpStatus.NO_CONTENT)
  async removeAll(): Promise<void> {
    await this.outboxService.removeAll();
  }
}
