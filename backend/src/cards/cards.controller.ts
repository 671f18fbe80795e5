import { Controller, Get, Param, Query, Res } from '@nestjs/common';
import type { Response } from 'express';
import { CurrentUser, type AuthUser } from '../common/decorators/current-user.decorator';
import { parseId } from '../common/pipes/parse-id.pipe';
import { DrillsService } from '../drills/drills.service';
import { windowsFor } from '../grading/grade-photo';
import { cardIdFor } from './card-id';
import { CardsService } from './cards.service';

/** The printable reference card of a drill: its kind and window count, an id of its own. */
@Controller('drills/:id')
export class CardsController {
  constructor(
    private readonly cardsService: CardsService,
    private readonly drillsService: DrillsService,
  ) {}

  @Get('card.pdf')
  async pdf(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string, @Query('paper') paper: string | undefined, @Res() response: Response): Promise<void> {
    const request = await this.requestFor(caller, id);
    const size = paper?.toUpperCase() === 'LETTER' ? 'LETTER' : 'A4';
    response
      .type('application/pdf')
      .setHeader('content-disposition', `attachment; filename="mixmark-card-${request.kind}-${size.toLowerCase()}.pdf"`)
      .send(await this.cardsService.pdf(request, size));
  }

  @Get('card.png')
  async png(@CurrentUser() caller: AuthUser, @Param('id', parseId()) id: string, @Res() response: Response): Promise<void> {
    const { png } = await this.cardsService.png(await this.requestFor(caller, id), 150);
    response.type('image/png').setHeader('cache-control', 'private, max-age=3600').send(png);
  }

  private async requestFor(caller: AuthUser, id: string) {
    const drill = await this.drillsService.findVisible(caller, id);
    return {
      kind: drill.kind,
      steps: drill.kind === 'value-ladder' ? windowsFor(drill) : undefined,
      id: cardIdFor(`drill/${drill.id}`),
    };
  }
}
