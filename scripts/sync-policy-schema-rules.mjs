// Copies the rule ids and titles of src/core/rules/catalog.ts into schema/policy.schema.json
// (`definitions.rules.properties`), so editors complete the ids the gate knows. Run after adding
// a rule: `node scripts/sync-policy-schema-rules.mjs`. test/policy/schema.test.ts fails until then.
import { readFileSync, writeFileSync } from 'node:fs';

const root = new URL('..', import.meta.url);
const source = readFileSync(new URL('src/core/rules/catalog.ts', root), 'utf8');
const body = source.slice(source.indexOf('export const RULES'));
const entry = /\n {2}'([a-z0-9-]+)': \{[\s\S]*?title:\s*(['"])((?:\\.|(?!\2).)*)\2/g;
const rules = Object.fromEntries(
  [...body.matchAll(entry)].map((match) => [match[1], match[3].replace(/\\(['"])/g, '$1')]),
);
if (Object.keys(rules).length === 0)
  throw new Error(
    "No rules found in src/core/rules/catalog.ts; expected entries like `  'rule-id': { ... title: '...' }`.",
  );

const schemaUrl = new URL('schema/policy.schema.json', root);
const schema = JSON.parse(readFileSync(schemaUrl, 'utf8'));
schema.definitions.rules.properties = Object.fromEntries(
  Object.entries(rules).map(([id, title]) => [
    id,
    { $ref: '#/definitions/ruleLevel', description: `${title}.` },
  ]),
);
writeFileSync(schemaUrl, `${JSON.stringify(schema, null, 2)}\n`);
console.log(`schema/policy.schema.json: ${Object.keys(rules).length} rule ids`);
