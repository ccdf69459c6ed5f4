import { Global, Module } from '@nestjs/common';
import { ThrottlerModule } from '@nestjs/throttler';
import { ExpensiveRouteGuard } from './expensive-route.guard';

/** The per-person limit on costly routes; `@Expensive()` puts a route under it. */
@Global()
@Module({
  // Only its storage is used, by ExpensiveRouteGuard; no route carries the stock guard.
  imports: [ThrottlerModule.forRoot([])],
  providers: [ExpensiveRouteGuard],
  exports: [ExpensiveRouteGuard, ThrottlerModule],
})
export class RateLimitModule {}
