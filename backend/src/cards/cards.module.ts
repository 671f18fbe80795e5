import { Module } from '@nestjs/common';
import { CardsService } from './cards.service';

/** Reference card generation (no controller yet: the API route comes with the drill pages). */
@Module({ providers: [CardsService], exports: [CardsService] })
export class CardsModule {}
