import { NotFoundException, ParseUUIDPipe } from '@nestjs/common';

/**
 * Route ids are UUIDs; anything else names nothing, so it is a 404 like any unknown id
 * (a caller learns nothing from the shape of the answer).
 */
export const parseId = () =>
  new ParseUUIDPipe({
    exceptionFactory: () => new NotFoundException({ code: 'not_found', message: 'There is nothing at this address.' }),
  });
