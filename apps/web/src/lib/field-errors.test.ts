import { describe, expect, it } from 'vitest';
import { ApiError } from './api-client';
import { splitFieldErrors } from './field-errors';

describe('splitting the API’s refusal by field', () => {
  it('puts each named part beside its field and keeps the rest', () => {
    const error = new ApiError(
      400,
      'matGsm: a mat needs its weight; lines.0.batchNumber: must not be empty; Something about the whole form',
      'validation_failed',
    );
    expect(splitFieldErrors(error, ['matGsm', 'lines.0.batchNumber'])).toEqual({
      fields: { matGsm: 'A mat needs its weight', 'lines.0.batchNumber': 'Must not be empty' },
      other: 'Something about the whole form',
    });
  });

  it('sends a part about a list item to the list', () => {
    const error = new ApiError(400, 'packSizes.1.size: must be more than 0', 'validation_failed');
    expect(splitFieldErrors(error, ['packSizes']).fields).toEqual({ packSizes: 'Must be more than 0' });
  });

  it('maps an error code to a field', () => {
    const error = new ApiError(409, 'The code RES-25 is already used', 'duplicate_code');
    expect(splitFieldErrors(error, ['code'], { duplicate_code: 'code' })).toEqual({
      fields: { code: 'The code RES-25 is already used' },
      other: null,
    });
  });
});
