/**
 * The two ways a config text is read, for the tests that hold the fast readers to the YAML path:
 * the fast reader alone, and the YAML path (the `yaml` package through the project's pipeline),
 * each as an `outcome` to compare.
 */
import { readJsonSource } from '../../src/core/parse/json-read.js';
import { checkJson } from '../../src/core/parse/json-syntax.js';
import { readYamlSource } from '../../src/core/parse/source.js';
import { readBlockYaml } from '../../src/core/parse/yaml-block.js';
import { outcome } from './helpers.js';

/** A JSON text through the fast JSON reader (`json-read.ts`). */
export const jsonViaFast = (text: string) => outcome(() => readJsonSource(text, 'config.json'));

/** The YAML path as `parseSource` took it for every JSON file before the fast reader: JSON syntax first. */
export const jsonViaYaml = (text: string) =>
  outcome(() => {
    checkJson(text, 'config.json');
    return readYamlSource(text, 'config.json', true);
  });

/** A block-YAML text through the fast block-YAML reader (`yaml-block.ts`). */
export const yamlViaFast = (text: string) => outcome(() => readBlockYaml(text, 'model.reach.yaml'));

/** A YAML text through the YAML path. */
export const yamlViaYaml = (text: string) =>
  outcome(() => readYamlSource(text, 'model.reach.yaml', false));
