import { MikroOrmModule } from '@mikro-orm/nestjs';
import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppEnvironment } from '../config/environment';
import { SigningKey } from '../signing/signing-key';
import { AuditEvent } from './audit-event.entity';
import { AuditHead } from './audit-head';
import { AuditController } from './audit.controller';
import { AuditService } from './audit.service';

@Module({
  imports: [MikroOrmModule.forFeature([AuditEvent])],
  controllers: [AuditController],
  providers: [
    AuditService,
    {
      provide: AuditHead,
      inject: [ConfigService, SigningKey],
      useFactory: (config: ConfigService<AppEnvironment, true>, key: SigningKey) =>
        new AuditHead(config.get('auditHeadPath', { infer: true }), key),
    },
  ],
  exports: [AuditService, AuditHead],
})
export class AuditModule {}
