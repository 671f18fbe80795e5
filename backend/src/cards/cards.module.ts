import { Module } from '@nestjs/common';
import { DrillsModule } from '../drills/drills.module';
import { CardsController } from './cards.controller';
import { CardsService } from './cards.service';
import { KindCardsController } from './kind-cards.controller';

/** Reference cards: generation, a drill's card and a card by kind, as PDF (to print) and PNG (to look at). */
@Module({
  imports: [DrillsModule],
  controllers: [CardsController, KindCardsController],
  providers: [CardsService],
  exports: [CardsService],
})
export class CardsModule {}
