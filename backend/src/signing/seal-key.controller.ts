import { Controller, Get } from '@nestjs/common';
import type { SealPublicKeyResponse } from '@tiermode/shared-types';
import { Public } from '../common/decorators/public.decorator';
import { ApiContract } from '../openapi/api-contract.decorator';
import { signedMessage, SigningKey } from './signing-key';

@Controller('seal')
export class SealKeyController {
  constructor(private readonly key: SigningKey) {}

  /** Public: anyone holding a calc package can check its seal's signature with this key. */
  @ApiContract({
    summary: 'The public key that signs seals and audit events',
    returns: 'SealPublicKeyResponse',
  })
  @Get('public-key')
  @Public()
  publicKey(): SealPublicKeyResponse {
    return {
      algorithm: 'Ed25519',
      keyId: this.key.keyId,
      publicKeyPem: this.key.publicKeyPem,
      messages: {
        seal: signedMessage('seal', '<seal hash>'),
        auditEvent: signedMessage('audit-event', '<event hash>'),
        auditHead: signedMessage('audit-head', '<seq>:<event hash>'),
      },
    };
  }
}
