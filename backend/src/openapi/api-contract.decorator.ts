import { HttpStatus, RequestMethod, StreamableFile } from '@nestjs/common';
import { HTTP_CODE_METADATA, METHOD_METADATA } from '@nestjs/common/constants';
import {
  ApiBody,
  ApiConsumes,
  ApiOperation,
  ApiProduces,
  ApiQuery,
  ApiResponse,
} from '@nestjs/swagger';
import type { ReferenceObject, SchemaObject } from '@nestjs/swagger';
import type { JsonAnswer } from '../common/json-answer';
import { contractRef, type ContractName, type ContractTypes } from './contract';
import { contractSchemas } from './contract-schemas';

type Returns = ContractName | `${ContractName}[]`;

/** The TypeScript type a `returns` name stands for. */
type ReturnedType<R> = R extends `${infer N extends ContractName}[]`
  ? ContractTypes[N][]
  : R extends ContractName
    ? ContractTypes[R]
    : never;

interface JsonRoute<R extends Returns | null> {
  summary: string;
  /** The shared-types type whose properties are the query parameters. */
  query?: ContractName;
  /** The shared-types request type the body follows (its DTO `implements` it). */
  body?: ContractName;
  /** The shared-types type of the JSON answer; null for an empty answer (204). */
  returns: R;
  /** A multipart upload: one part named "file", and any other form fields. */
  upload?: { description: string; fields?: Record<string, SchemaObject> };
}

interface FileRoute {
  summary: string;
  body?: ContractName;
  /** The content type of the file answered. */
  file: string;
}

/** A route method answering T, as a value or as its JSON already made (JsonAnswer). */
type MethodOf<T> = (...args: never[]) => T | JsonAnswer<T> | Promise<T | JsonAnswer<T>>;

/**
 * Documents a route in the OpenAPI document with the shared-types contract: a summary, the
 * request body's type, the success status (the same one Nest answers with: @HttpCode, else 201
 * for POST and 200 for the rest) with the answer's type, and the error body every refusal
 * carries. Put it above the route decorators, since it reads what they set.
 */
export function ApiContract<R extends Returns | null>(
  spec: JsonRoute<R>,
): <T extends MethodOf<R extends Returns ? ReturnedType<R> : void>>(
  target: object,
  key: string | symbol,
  descriptor: TypedPropertyDescriptor<T>,
) => void;
export function ApiContract(
  spec: FileRoute,
): <T extends MethodOf<StreamableFile>>(
  target: object,
  key: string | symbol,
  descriptor: TypedPropertyDescriptor<T>,
) => void;
export function ApiContract(spec: JsonRoute<Returns | null> | FileRoute) {
  return (target: object, key: string | symbol, descriptor: PropertyDescriptor): void => {
    const method: unknown = Reflect.getMetadata(METHOD_METADATA, descriptor.value as object);
    if (method === undefined) {
      throw new Error(
        `@ApiContract on ${String(key)} must stand above the route decorator (@Get, @Post, ...)`,
      );
    }
    const status =
      (Reflect.getMetadata(HTTP_CODE_METADATA, descriptor.value as object) as number | undefined) ??
      (method === RequestMethod.POST ? HttpStatus.CREATED : HttpStatus.OK);
    const decorators: MethodDecorator[] = [
      ApiOperation({ summary: spec.summary }),
      ApiResponse({
        status: '4XX',
        description: 'Refused; `message` names each field (and row) at fault',
        schema: contractRef('ApiErrorBody'),
      }),
    ];
    if ('file' in spec) {
      decorators.push(
        ApiProduces(spec.file),
        ApiResponse({
          status,
          description: 'The file',
          content: { [spec.file]: { schema: { type: 'string', format: 'binary' } } },
        }),
      );
    } else {
      const schema: SchemaObject | ReferenceObject | undefined = spec.returns?.endsWith('[]')
        ? { type: 'array', items: contractRef(spec.returns.slice(0, -2)) }
        : spec.returns
          ? contractRef(spec.returns)
          : undefined;
      decorators.push(ApiResponse({ status, description: 'Done', ...(schema ? { schema } : {}) }));
    }
    if ('upload' in spec && spec.upload) {
      decorators.push(
        ApiConsumes('multipart/form-data'),
        ApiBody({
          description: spec.upload.description,
          schema: {
            type: 'object',
            required: ['file'],
            properties: { file: { type: 'string', format: 'binary' }, ...spec.upload.fields },
          },
        }),
      );
    } else if (spec.body) {
      decorators.push(ApiBody({ schema: contractRef(spec.body) }));
    }
    if ('query' in spec && spec.query) decorators.push(...queryParameters(spec.query));
    for (const decorate of decorators) decorate(target, key, descriptor);
  };
}

/** One optional-or-required query parameter per property of a contract object type. */
function queryParameters(name: ContractName): MethodDecorator[] {
  const schema = contractSchemas()[name];
  const required = new Set(schema.required ?? []);
  return Object.entries(schema.properties ?? {}).map(([property, propertySchema]) =>
    ApiQuery({ name: property, required: required.has(property), schema: propertySchema }),
  );
}
