import { Global, Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { AppEnvironment } from '../config/environment';
import { SealKeyController } from './seal-key.controller';
import { SigningKey } from './signing-key';

/** The server's Ed25519 key, for the seals and the audit trail, and its published public half. */
@Global()
@Module({
  controllers: [SealKeyController],
  providers: [
    {
      provide: SigningKey,
      inject: [ConfigService],
      useFactory: (config: ConfigService<AppEnvironment, true>) =>
        new SigningKey(config.get('sealPrivateKeyPem', { infer: true })),
    },
  ],
  exports: [SigningKey],
})
export class SigningModule {}
