import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** The parts of an OpenAPI 3.1 document the reference page reads. */
export interface JsonSchema {
  type?: string | string[];
  $ref?: string;
  format?: string;
  description?: string;
  enum?: unknown[];
  const?: unknown;
  pattern?: string;
  default?: unknown;
  minimum?: number;
  maximum?: number;
  exclusiveMinimum?: number;
  maxLength?: number;
  minLength?: number;
  properties?: Record<string, JsonSchema>;
  required?: string[];
  additionalProperties?: boolean | JsonSchema;
  items?: JsonSchema;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  allOf?: JsonSchema[];
}

export interface Operation {
  operationId: string;
  tags?: string[];
  summary?: string;
  description?: string;
  parameters?: { name: string; in: string; required?: boolean; description?: string; schema?: JsonSchema }[];
  requestBody?: { content: Record<string, { schema?: JsonSchema }> };
  responses: Record<string, { description: string; content?: Record<string, { schema?: JsonSchema }> }>;
  'x-roles'?: string[];
  'x-public'?: boolean;
  'x-api-token'?: boolean;
}

export interface OpenApiDocument {
  openapi: string;
  info: { title: string; version: string; description?: string };
  tags?: { name: string; description?: string }[];
  paths: Record<string, Record<string, Operation>>;
  components?: { schemas?: Record<string, JsonSchema> };
}

export const getOpenApi = () => api.get<OpenApiDocument>('/api/openapi.json');

export const getOpenApiQueryOptions = () =>
  queryOptions({ queryKey: ['openapi', 'document'], queryFn: getOpenApi, staleTime: Infinity });

export const useOpenApi = () => useQuery(getOpenApiQueryOptions());
