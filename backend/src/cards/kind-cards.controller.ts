import { BadRequestException, Controller, Get, Param, Query, Res } from '@nestjs/common';
import type { Response } from 'express';
import { cardIdFor } from './card-id';
import { cardKinds, isCardKind, resolveSteps } from './card-kinds';
import type { CardKind } from './card-layout.types';
import { CardsService, type CardRequest } from './cards.service';

/**
 * A reference card by kind, for a drill not saved yet (the editor's "measure my own swatch") and
 * for practice on paper before a drill exists. Any signed-in person may print one: the card
 * carries no drill, only its kind, its window count and an id derived from both.
 */
@Controller('cards/:kind')
export class KindCardsController {
  constructor(private readonly cardsService: CardsService) {}

  @Get('card.pdf')
  async pdf(
    @Param('kind') kind: string,
    @Query('steps') steps: string | undefined,
    @Query('paper') paper: string | undefined,
    @Res() response: Response,
  ): Promise<void> {
    const request = this.requestFor(kind, steps);
    const size = paper?.toUpperCase() === 'LETTER' ? 'LETTER' : 'A4';
    response
      .type('application/pdf')
      .setHeader(
        'content-disposition',
        `attachment; filename="mixmark-card-${request.kind}-${size.toLowerCase()}.pdf"`,
      )
      .send(await this.cardsService.pdf(request, size));
  }

  @Get('card.png')
  async png(
    @Param('kind') kind: string,
    @Query('steps') steps: string | undefined,
    @Res() response: Response,
  ): Promise<void> {
    const { png } = await this.cardsService.png(this.requestFor(kind, steps), 150);
    response.type('image/png').setHeader('cache-control', 'private, max-age=3600').send(png);
  }

  /** @throws BadRequestException `card_kind_unknown` / `card_steps_invalid` naming what fits */
  private requestFor(kind: string, stepsText: string | undefined): CardRequest {
    if (!isCardKind(kind)) {
      throw new BadRequestException({
        code: 'card_kind_unknown',
        message: `There is no "${kind}" card; the kinds are ${cardKinds.join(', ')}.`,
        details: { kind: 'oneOf' },
      });
    }
    const steps = stepsText === undefined || stepsText === '' ? undefined : Number(stepsText);
    try {
      const count = resolveSteps(kind as CardKind, steps);
      return {
        kind,
        steps: kind === 'value-ladder' ? count : undefined,
        id: cardIdFor(`${kind}/${count}`),
      };
    } catch {
      throw new BadRequestException({
        code: 'card_steps_invalid',
        message:
          kind === 'value-ladder'
            ? 'A value ladder card has 2 to 9 steps.'
            : `A ${kind} card has a fixed number of windows; leave steps out.`,
        details: { steps: 'invalid' },
      });
    }
  }
}
