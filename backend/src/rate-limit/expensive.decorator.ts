import { applyDecorators, UseGuards } from '@nestjs/common';
import { ApiResponse } from '@nestjs/swagger';
import { ExpensiveRouteGuard } from './expensive-route.guard';

/** A route whose work is costly: counted against each person's limit a minute (429 past it). */
export const Expensive = (): MethodDecorator & ClassDecorator =>
  applyDecorators(
    UseGuards(ExpensiveRouteGuard),
    ApiResponse({
      status: 429,
      description: 'Too many costly requests from this person in the last minute (see Retry-After)',
    }),
  );
