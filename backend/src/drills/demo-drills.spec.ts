import { describe, expect, it } from '@jest/globals';
import { createDrillSchema, validationDetails } from '@mixmark/common';
import { ValidationError } from 'yup';
import { demoDrills } from '../database/seeds/demo-teaching';

/** The demo seed writes its drills straight to the database; they must still be drills a teacher could save. */
describe('the demo seed\'s drills', () => {
  it.each(demoDrills.map((demo) => [demo.key, demo] as const))('%s should pass the drill schema a teacher\'s form and the API use', async (_key, demo) => {
    const input = { title: demo.title, kind: demo.kind, instructions: demo.instructions, targets: demo.targets, palette: demo.palette, visibility: demo.visibility };
    let details: Record<string, string> = {};
    try {
      await createDrillSchema.validate(input, { abortEarly: false, stripUnknown: true });
    } catch (error) {
      if (!(error instanceof ValidationError)) throw error;
      details = validationDetails(error);
    }
    expect(details).toEqual({});
  });

  it('should include a value ladder and a neutral, the kinds with target rules', () => {
    expect(demoDrills.map((demo) => demo.kind)).toEqual(expect.arrayContaining(['value-ladder', 'neutral']));
  });
});
