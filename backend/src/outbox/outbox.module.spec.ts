import { describe, expect, it } from '@jest/globals';
import { OutboxController } from './outbox.controller';
import { OutboxModule } from './outbox.module';
import { OutboxService } from './outbox.service';

describe('OutboxModule.register', () => {
  it('should have no routes and no service in production', () => {
    const module = OutboxModule.register('production');
    expect(module.controllers ?? []).toEqual([]);
    expect(module.providers ?? []).toEqual([]);
  });

  it.each(['development', 'test', undefined])(
    'should register the outbox routes when NODE_ENV is %s',
    (nodeEnv) => {
      const module = OutboxModule.register(nodeEnv);
      expect(module.controllers).toEqual([OutboxController]);
      expect(module.providers).toEqual([OutboxService]);
    },
  );
});
