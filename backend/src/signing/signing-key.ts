import {
  createHash,
  createPrivateKey,
  createPublicKey,
  sign,
  verify,
  type KeyObject,
} from 'node:crypto';

/**
 * What a signature is for; it is part of the signed message, so a signature made for one
 * purpose can never pass for another (an audit event's for a seal, say).
 */
export type SignaturePurpose = 'seal' | 'audit-event' | 'audit-head';

/** The message signed for `purpose` over `value`: `tiermode-<purpose>:<value>`, UTF-8. */
export function signedMessage(purpose: SignaturePurpose, value: string): string {
  return `tiermode-${purpose}:${value}`;
}

/**
 * The Ed25519 key that signs seals and audit events (node:crypto; RFC 8032). It lives outside
 * the database, so someone who can edit the database can recompute a SHA-256 but cannot sign.
 */
export class SigningKey {
  private readonly privateKey: KeyObject;
  private readonly publicKey: KeyObject;
  /** The public key as SPKI PEM, for GET /api/seal/public-key and standard tools. */
  readonly publicKeyPem: string;
  /** The first 16 hex digits of the SHA-256 of the public key's DER (SPKI) encoding. */
  readonly keyId: string;

  constructor(privateKeyPem: string) {
    this.privateKey = createPrivateKey(privateKeyPem);
    if (this.privateKey.asymmetricKeyType !== 'ed25519') {
      throw new Error('The seal key must be an Ed25519 key');
    }
    this.publicKey = createPublicKey(this.privateKey);
    this.publicKeyPem = this.publicKey.export({ type: 'spki', format: 'pem' }).toString();
    const der = this.publicKey.export({ type: 'spki', format: 'der' });
    this.keyId = createHash('sha256').update(der).digest('hex').slice(0, 16);
  }

  /** Ed25519 signature (base64) of `tiermode-<purpose>:<value>`. */
  sign(purpose: SignaturePurpose, value: string): string {
    return sign(null, Buffer.from(signedMessage(purpose, value), 'utf8'), this.privateKey).toString(
      'base64',
    );
  }

  verify(purpose: SignaturePurpose, value: string, signature: string | null | undefined): boolean {
    if (!signature) return false;
    const bytes = Buffer.from(signature, 'base64');
    if (bytes.length !== 64) return false;
    return verify(null, Buffer.from(signedMessage(purpose, value), 'utf8'), this.publicKey, bytes);
  }
}
