import { BadRequestException } from '@nestjs/common';
import { DISPLAY_UNITS, type WholeCalculationDto, type UnitSystem } from '@tiermode/shared-types';

/**
 * The units a results file or calc package is written in: the `units` query (`SI` or `US`), or
 * the units the calc is kept in. Anything else is refused, naming the field.
 */
export function exportUnits(units: string | undefined, calc: WholeCalculationDto): UnitSystem {
  if (units === undefined || units === '') return calc.displayUnits;
  if (!(DISPLAY_UNITS as readonly string[]).includes(units)) {
    throw new BadRequestException([`units must be one of ${DISPLAY_UNITS.join(', ')}`]);
  }
  return units as UnitSystem;
}
