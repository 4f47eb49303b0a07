/**
 * GitHub's published REST description (`@octokit/openapi`, api.github.com.json), loaded once:
 * request matching and checking, response checking, and minimal schema-valid samples the fake
 * server builds its answers from.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { Ajv } from 'ajv';
import type { ValidateFunction } from 'ajv';
import { elementAt } from '../../src/core/element-at.js';

type Schema = Record<string, unknown>;

interface Parameter {
  name: string;
  in: 'path' | 'query' | 'header' | 'cookie';
  required?: boolean;
  schema?: Schema;
  'x-multi-segment'?: boolean;
}

export interface Operation {
  operationId: string;
  method: string;
  template: string;
  parameters: Parameter[];
  requestBody: { required?: boolean; content: Record<string, { schema: Schema }> } | null;
  responses: Record<string, unknown>;
}

interface Route {
  operation: Operation;
  pattern: RegExp;
  names: string[];
  literals: number;
}

interface Spec {
  paths: Record<string, Record<string, Schema>>;
  components: Record<string, Record<string, Schema>>;
}

let spec: Spec | null = null;
let routes: Route[] | null = null;
const validators = new Map<string, ValidateFunction>();
const ajv = new Ajv({
  strict: false,
  allErrors: true,
  validateFormats: false,
  allowUnionTypes: true,
});

export const OPENAPI_FILE = createRequire(import.meta.url).resolve(
  '@octokit/openapi/generated/api.github.com.json',
);

export function loadSpec(): Spec {
  spec ??= JSON.parse(readFileSync(OPENAPI_FILE, 'utf8')) as Spec;
  return spec;
}

/** The schema a `#/components/<group>/<name>` reference names; throws for any other reference. */
function componentAt(ref: string): Schema {
  const match = /^#\/components\/([^/]+)\/([^/]+)$/.exec(ref);
  const target = match && loadSpec().components[elementAt(match, 1)]?.[elementAt(match, 2)];
  if (!target) throw new Error(`GitHub's REST description has no ${ref}`);
  return target;
}

/** Follows `#/components/<group>/<name>` references. */
export function resolveRef<T = Schema>(node: unknown): T {
  let current = node as Schema;
  for (let guard = 0; current && typeof current.$ref === 'string' && guard < 20; guard += 1) {
    current = componentAt(current.$ref);
  }
  return current as T;
}

function buildRoutes(): Route[] {
  const result: Route[] = [];
  for (const [template, item] of Object.entries(loadSpec().paths)) {
    for (const [method, raw] of Object.entries(item)) {
      if (!['get', 'post', 'put', 'patch', 'delete', 'head'].includes(method)) continue;
      const parameters = ((raw.parameters as unknown[] | undefined) ?? []).map((parameter) =>
        resolveRef<Parameter>(parameter),
      );
      const names: string[] = [];
      let literals = 0;
      const source = template
        .split('/')
        .map((segment) => {
          const match = /^\{(.+)\}$/.exec(segment);
          if (!match) {
            literals += 1;
            return segment.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
          }
          const name = elementAt(match, 1);
          names.push(name);
          const multi = parameters.find((parameter) => parameter.name === name)?.[
            'x-multi-segment'
          ];
          return multi ? '(.+)' : '([^/]+)';
        })
        .join('/');
      result.push({
        operation: {
          operationId: raw.operationId as string,
          method: method.toUpperCase(),
          template,
          parameters,
          requestBody: raw.requestBody
            ? resolveRef<Operation['requestBody']>(raw.requestBody)
            : null,
          responses: raw.responses as Record<string, unknown>,
        },
        pattern: new RegExp(`^${source}$`),
        names,
        literals,
      });
    }
  }
  // The most literal template wins: /issues/comments/{id} before /issues/{issue_number}.
  return result.sort((a, b) => b.literals - a.literals);
}

/** Components already handed to ajv, by their `#/components/<group>/<name>` reference. */
const components = new Set<string>();

/** The `$id` a component has in ajv (any URI serves; this one names nothing real). */
const componentId = (ref: string) =>
  `https://openapi.example.invalid/${ref.slice('#/components/'.length)}`;

/**
 * An OpenAPI 3.0 schema as draft-07 JSON Schema for ajv, `nullable` spelled out. A referenced
 * component is handed to ajv once, under an id of its own, and referred to by it: ajv compiles
 * each component once per worker and every validator that uses it shares the compiled code (a
 * copy per validator cost seconds of compiling per test worker).
 */
function adapt(node: unknown): unknown {
  if (Array.isArray(node)) return node.map((item) => adapt(item));
  if (node === null || typeof node !== 'object') return node;
  const source = node as Schema;
  if (typeof source.$ref === 'string') {
    const ref = source.$ref;
    if (!components.has(ref)) {
      // Marked first: a component that refers to itself finds its id and stops there.
      components.add(ref);
      ajv.addSchema(adapt(componentAt(ref)) as Schema, componentId(ref));
    }
    return { $ref: componentId(ref) };
  }
  const out: Schema = {};
  for (const [key, value] of Object.entries(source)) {
    if (
      key === 'nullable' ||
      key === 'discriminator' ||
      key === 'example' ||
      key === 'examples' ||
      key.startsWith('x-')
    )
      continue;
    if (key === 'properties' || key === 'patternProperties') {
      out[key] = Object.fromEntries(
        Object.entries(value as Schema).map(([name, schema]) => [name, adapt(schema)]),
      );
    } else if (['items', 'additionalProperties', 'not', 'allOf', 'anyOf', 'oneOf'].includes(key)) {
      out[key] = adapt(value);
    } else {
      out[key] = value;
    }
  }
  return source.nullable === true ? { anyOf: [out, { type: 'null' }] } : out;
}

function validatorFor(id: string, schema: unknown): ValidateFunction {
  let validate = validators.get(id);
  if (!validate) {
    validate = ajv.compile(adapt(schema) as Schema);
    validators.set(id, validate);
  }
  return validate;
}

function describeErrors(validate: ValidateFunction): string {
  return (validate.errors ?? [])
    .slice(0, 5)
    .map((error) => `${error.instancePath || '/'} ${error.message ?? ''}`)
    .join('; ');
}

export interface RequestCheck {
  operation: Operation | null;
  params: Record<string, string>;
  problems: string[];
}

/** Coerces a path or query value the way the schema types it. */
function coerce(value: string, schema: Schema | undefined): unknown {
  const type = schema?.type;
  if (type === 'integer' || type === 'number') return value.trim() === '' ? value : Number(value);
  if (type === 'boolean') return value === 'true' ? true : value === 'false' ? false : value;
  return value;
}

/** Matches a request against the description and checks its parameters and JSON body. */
export function checkRequest(
  method: string,
  rawPath: string,
  query: URLSearchParams,
  contentType: string | undefined,
  body: string,
): RequestCheck {
  routes ??= buildRoutes();
  const problems: string[] = [];
  const route = routes.find(
    (candidate) => candidate.operation.method === method && candidate.pattern.test(rawPath),
  );
  if (!route)
    return {
      operation: null,
      params: {},
      problems: [`${method} ${rawPath} matches no operation of GitHub's REST description`],
    };
  const { operation } = route;
  const match = route.pattern.exec(rawPath) as RegExpExecArray;
  const params: Record<string, string> = {};
  route.names.forEach((name, index) => {
    let value: string;
    try {
      value = decodeURIComponent(elementAt(match, index + 1));
    } catch {
      problems.push(`path parameter ${name} is not valid percent-encoding: ${match[index + 1]}`);
      return;
    }
    params[name] = value;
    const parameter = operation.parameters.find(
      (candidate) => candidate.in === 'path' && candidate.name === name,
    );
    if (parameter?.schema) {
      const validate = validatorFor(`${operation.operationId}#path:${name}`, parameter.schema);
      if (!validate(coerce(value, resolveRef(parameter.schema))))
        problems.push(
          `path parameter ${name}=${JSON.stringify(value)}: ${describeErrors(validate)}`,
        );
    }
  });
  for (const [name, value] of query) {
    const parameter = operation.parameters.find(
      (candidate) => candidate.in === 'query' && candidate.name === name,
    );
    if (!parameter) {
      problems.push(`query parameter ${name} is not a parameter of ${operation.operationId}`);
      continue;
    }
    if (parameter.schema) {
      const validate = validatorFor(`${operation.operationId}#query:${name}`, parameter.schema);
      if (!validate(coerce(value, resolveRef(parameter.schema))))
        problems.push(
          `query parameter ${name}=${JSON.stringify(value)}: ${describeErrors(validate)}`,
        );
    }
  }
  for (const parameter of operation.parameters) {
    if (parameter.in === 'query' && parameter.required && !query.has(parameter.name))
      problems.push(`required query parameter ${parameter.name} is missing`);
  }
  const json = operation.requestBody?.content?.['application/json'];
  if (operation.requestBody && json) {
    if (body === '') {
      if (operation.requestBody.required)
        problems.push(`${operation.operationId} requires a JSON body; none was sent`);
    } else if (!(contentType ?? '').toLowerCase().startsWith('application/json')) {
      problems.push(
        `${operation.operationId} expects content-type application/json; got ${JSON.stringify(contentType)}`,
      );
    } else {
      let parsed: unknown;
      try {
        parsed = JSON.parse(body);
        const validate = validatorFor(`${operation.operationId}#body`, json.schema);
        if (!validate(parsed))
          problems.push(`request body of ${operation.operationId}: ${describeErrors(validate)}`);
      } catch {
        problems.push(`request body of ${operation.operationId} is not JSON`);
      }
    }
  } else if (body !== '') {
    problems.push(`${operation.operationId} takes no request body; got ${body.length} characters`);
  }
  return { operation, params, problems };
}

/** Checks a JSON answer against the response the description documents for that status. */
export function checkResponse(operation: Operation, status: number, value: unknown): string[] {
  let documented = operation.responses[String(status)] ?? operation.responses.default;
  // The description lists only some error statuses per operation; every error body is a basic-error.
  if (!documented && status >= 400)
    documented = {
      content: { 'application/json': { schema: { $ref: '#/components/schemas/basic-error' } } },
    };
  if (!documented) return [`${operation.operationId} documents no ${status} response`];
  const response = resolveRef<{ content?: Record<string, { schema: Schema }> }>(documented);
  const schema = response.content?.['application/json']?.schema;
  if (!schema)
    return value === undefined
      ? []
      : [`${operation.operationId} documents no JSON body for ${status}`];
  const validate = validatorFor(`${operation.operationId}#response:${status}`, schema);
  return validate(value)
    ? []
    : [`${status} answer of ${operation.operationId}: ${describeErrors(validate)}`];
}

/**
 * The smallest value the schema admits: required properties only, nullable ones null, the
 * first enum value or alternative. The fake lays its own state over it.
 */
export function sample(node: unknown, depth = 0, top = true): unknown {
  const schema = resolveRef(node);
  if (!schema || depth > 30) return null;
  if (!top && schema.nullable === true) return null;
  if (Array.isArray(schema.allOf)) {
    return Object.assign(
      {},
      ...(schema.allOf as unknown[]).map((part) => sample(part, depth + 1, true)),
    );
  }
  const alternatives = (schema.oneOf ?? schema.anyOf) as unknown[] | undefined;
  if (alternatives) return sample(alternatives[0], depth + 1, top);
  if (Array.isArray(schema.enum)) return schema.enum[0];
  switch (schema.type) {
    case 'array':
      return [];
    case 'string':
      return schema.format === 'date-time'
        ? '2024-01-01T00:00:00Z'
        : schema.format === 'uri'
          ? 'https://example.invalid/sample'
          : schema.format === 'email'
            ? 'someone@example.invalid'
            : 'sample';
    case 'integer':
    case 'number':
      return 1;
    case 'boolean':
      return false;
    default: {
      const out: Record<string, unknown> = {};
      const properties = (schema.properties ?? {}) as Record<string, unknown>;
      for (const name of (schema.required as string[] | undefined) ?? [])
        out[name] = sample(properties[name] ?? {}, depth + 1, false);
      return out;
    }
  }
}

/** A sample of the named component schema (`#/components/schemas/<name>`). */
const samples = new Map<string, unknown>();

export function sampleOf(name: string): Record<string, unknown> {
  if (!samples.has(name)) samples.set(name, sample({ $ref: `#/components/schemas/${name}` }));
  return structuredClone(samples.get(name)) as Record<string, unknown>;
}
