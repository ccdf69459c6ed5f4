import { StreamableFile } from '@nestjs/common';

/**
 * A value of type T already turned into UTF-8 JSON (JSON.stringify, then encoded): made where
 * the value was made, such as on a worker thread, and handed over without a copy. The brand
 * keeps the type of what was encoded; it exists only for the compiler.
 */
export type JsonBytes<T> = Uint8Array & { readonly __jsonOf?: T };

/** JSON.stringify, then UTF-8, keeping the type of what was encoded. */
export function jsonBytes<T>(value: T): JsonBytes<T> {
  return new TextEncoder().encode(JSON.stringify(value));
}

/**
 * A route's answer given as JsonBytes: sent as they are, as application/json (Nest would
 * otherwise turn a byte array into JSON again). @ApiContract checks T against the route's type.
 */
export class JsonAnswer<T> extends StreamableFile {
  declare private readonly __answerOf?: T;

  constructor(bytes: JsonBytes<T>) {
    super(bytes, { type: 'application/json; charset=utf-8', length: bytes.byteLength });
  }
}
