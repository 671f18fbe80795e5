import { Module, type DynamicModule } from '@nestjs/common';
import { OutboxController } from './outbox.controller';
import { OutboxService } from './outbox.service';

/**
 * The development outbox: `GET /api/dev/outbox`, `GET /api/dev/outbox/:id`,
 * `DELETE /api/dev/outbox`, over the folder the fake SMTP server writes (`mail.outboxDir`).
 */
@Module({})
export class OutboxModule {
  /**
   * The module for an environment: empty in production (no routes, no service), so the outbox
   * API cannot exist there; the controller and service everywhere else.
   * @param nodeEnv usually `process.env.NODE_ENV`; unset counts as development
   * @example imports: [OutboxModule.register(process.env.NODE_ENV)]
   */
  static register(nodeEnv: string | undefined): DynamicModule {
    if (nodeEnv === 'production') return { module: OutboxModule };
    return {
      module: OutboxModule,
      controllers: [OutboxController],
      providers: [OutboxService],
      exports: [OutboxService],
    };
  }
}
