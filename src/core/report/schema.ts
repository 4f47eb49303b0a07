import { schemaUrl } from '../home.js';
import { GATE_JSON_SCHEMA } from './read.js';

type Schema = Record<string, unknown>;

/**
 * The JSON Schema of the report `renderGateJson` writes, as published in
 * `schema/report.schema.json`: the reader's own schema (`GATE_JSON_SCHEMA`, every field checked)
 * plus the fields a reader does not need back, `toolVersion` and `notice`. The build writes the
 * file from this, and a test checks the file, so the two never drift.
 */
export function publishedReportSchema(): Schema {
  const properties = GATE_JSON_SCHEMA.properties as Record<string, Schema>;
  const required = GATE_JSON_SCHEMA.required as string[];
  const { version, ...rest } = properties;
  return {
    $schema: 'http://json-schema.org/draft-07/schema#',
    $id: schemaUrl('report.schema.json'),
    title: 'context-reach report',
    description:
      "The JSON report of the context-reach gate (`context-reach diff --format json`, the action's `report-json`): the verdict, and per changed model config both versions' spec, metrics, deltas and findings with their remedies. Numbers are estimates from the config alone.",
    ...GATE_JSON_SCHEMA,
    properties: {
      version: {
        ...version,
        description: "Version of the report's shape; bumped on any incompatible change.",
      },
      toolVersion: {
        type: 'string',
        pattern: '^\\d+\\.\\d+\\.\\d+(?:[-+][0-9A-Za-z.-]+)?$',
        description: 'The context-reach release that wrote the report.',
      },
      notice: {
        type: 'string',
        description: 'What the numbers are: estimates from the config alone.',
      },
      ...rest,
    },
    required: [
      'version',
      'toolVersion',
      'notice',
      ...required.filter((name) => name !== 'version'),
    ],
  };
}
