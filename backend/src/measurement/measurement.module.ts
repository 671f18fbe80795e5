import { Module } from '@nestjs/common';
import { MeasurementService } from './measurement.service';

/** Photo measurement, pure of HTTP: used by attempts, the grading workers and the CLI. */
@Module({ providers: [MeasurementService], exports: [MeasurementService] })
export class MeasurementModule {}
