import type { ValidationError } from 'class-validator';
import { formatValidationErrors } from './format-validation-errors';

const error = (
  property: string,
  constraints?: Record<string, string>,
  children: ValidationError[] = [],
) => ({ property, constraints, children }) as ValidationError;

describe('formatValidationErrors', () => {
  it('names the full path and the storey of a nested field', () => {
    const tree = [
      error('storeys', undefined, [
        error('3', undefined, [error('mass', { isPositive: 'mass must be a positive number' })]),
      ]),
    ];
    expect(formatValidationErrors(tree)).toEqual([
      'storeys[3].mass (storey 4) must be a positive number',
    ]);
  });

  it('names the point of a spectrum field and keeps top-level messages as they are', () => {
    const tree = [
      error('spectrum', undefined, [
        error('points', undefined, [
          error('0', undefined, [error('sa', { isNumber: 'sa must be a number' })]),
        ]),
      ]),
      error('dampingRatio', { max: 'dampingRatio must be less than 1' }),
    ];
    expect(formatValidationErrors(tree)).toEqual([
      'spectrum.points[0].sa (point 1) must be a number',
      'dampingRatio must be less than 1',
    ]);
  });

  it('names the storey inside a nested inputs object too', () => {
    const tree = [
      error('inputs', undefined, [
        error('storeys', undefined, [
          error('1', undefined, [
            error('height', { isPositive: 'height must be a positive number' }),
          ]),
        ]),
      ]),
    ];
    expect(formatValidationErrors(tree)).toEqual([
      'inputs.storeys[1].height (storey 2) must be a positive number',
    ]);
  });

  it('rewrites whitelist refusals with the path', () => {
    const tree = [
      error('storeys', undefined, [
        error('0', undefined, [
          error('colour', { whitelistValidation: 'property colour should not exist' }),
        ]),
      ]),
    ];
    expect(formatValidationErrors(tree)).toEqual([
      'property storeys[0].colour (storey 1) should not exist',
    ]);
  });
});
