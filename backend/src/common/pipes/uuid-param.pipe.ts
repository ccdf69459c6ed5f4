import { BadRequestException, ParseUUIDPipe } from '@nestjs/common';

/** A route id that must be a UUID; anything else gets 400 naming the parameter. */
export const UuidParam = (name: string) =>
  new ParseUUIDPipe({
    exceptionFactory: () => new BadRequestException([`${name} must be a UUID`]),
  });
