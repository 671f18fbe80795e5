import { Module } from '@nestjs/common';
import { DrillsModule } from '../drills/drills.module';
import { CardsController } from './cards.controller';
import { CardsService } from './cards.service';

/** Reference cards: generation, and the drill's card as PDF (to print) and PNG (to look at). */
@Module({ imports: [DrillsModule], controllers: [CardsController], providers: [CardsService], exports: [CardsService] })
export class CardsModule {}
