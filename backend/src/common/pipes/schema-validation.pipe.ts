import { BadRequestException, Injectable, type PipeTransform } from '@nestjs/common';
import { validationDetails } from '@mixmark/common';
import { ValidationError, type Schema } from 'yup';

/**
 * Validates a request part against a yup schema shared from `@mixmark/common` (the same schema
 * the form uses), strips unknown keys, and answers a 400 whose `details` name each bad field.
 *
 * @example `@Body(new SchemaValidationPipe(createDrillSchema)) body: CreateDrill`
 */
@Injectable()
export class SchemaValidationPipe<T> implements PipeTransform<unknown, Promise<T>> {
  constructor(private readonly schema: Schema<T>) {}

  async transform(value: unknown): Promise<T> {
    try {
      return await this.schema.validate(value, { abortEarly: false, stripUnknown: true });
    } catch (error) {
      if (error instanceof ValidationError) {
        throw new BadRequestException({
          code: 'validation_failed',
          message: error.errors.join('; '),
          details: validationDetails(error),
        });
      }
      throw error;
    }
  }
}
