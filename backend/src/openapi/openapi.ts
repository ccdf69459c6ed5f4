import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import { contractSchemas } from './contract-schemas';

export const OPENAPI_PATH = 'api/docs';
export const OPENAPI_JSON_PATH = 'api/docs/openapi.json';

/** The OpenAPI 3 document of every route, from the routes' decorators and the shared contract. */
export function createOpenApiDocument(app: INestApplication): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Tiermode API')
    .setDescription(
      'Seismic modal response spectrum analysis of shear buildings, and the review, lock and seal of ' +
        'calculations. Every request and response type is the shared-types contract, published ' +
        'under components.schemas. Results are preliminary until a licensed reviewer locks the ' +
        'calc; the local building code and the engineer of record govern.',
    )
    .setVersion('1')
    // 3.1: its schemas are JSON Schema, as the contract's are (const, type lists for null).
    .setOpenAPIVersion('3.1.0')
    .addBearerAuth({ type: 'http', scheme: 'bearer', bearerFormat: 'JWT' }, 'bearer')
    .addSecurityRequirements('bearer')
    .build();
  const document = SwaggerModule.createDocument(app, config);
  document.components = {
    ...document.components,
    schemas: { ...contractSchemas(), ...document.components?.schemas },
  };
  return document;
}

/** Serves the document at /api/docs (the browsable page) and /api/docs/openapi.json. */
export function setupOpenApi(app: INestApplication): void {
  SwaggerModule.setup(OPENAPI_PATH, app, () => createOpenApiDocument(app), {
    jsonDocumentUrl: OPENAPI_JSON_PATH,
    yamlDocumentUrl: 'api/docs/openapi.yaml',
    customSiteTitle: 'Tiermode API',
  });
}
