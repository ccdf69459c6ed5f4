import type { SchemaObject } from '@nestjs/swagger';
import contract from '@tiermode/shared-types/contract.schema.json';

let cached: Record<string, SchemaObject> | undefined;

/**
 * The JSON Schema of every shared-types export (made by ts-json-schema-generator when
 * shared-types is built), with its draft-07 `#/definitions/` references turned into OpenAPI's
 * `#/components/schemas/`. Callers get copies, so nothing can change the cached one.
 */
export function contractSchemas(): Record<string, SchemaObject> {
  cached ??= JSON.parse(
    JSON.stringify(contract.definitions).replaceAll('"#/definitions/', '"#/components/schemas/'),
  ) as Record<string, SchemaObject>;
  return structuredClone(cached);
}
