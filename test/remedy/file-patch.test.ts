import { describe, expect, it } from 'vitest';
import { readModel } from '../../src/core/parse/read-model.js';
import { parsePolicy } from '../../src/core/policy/parse.js';
import {
  applyChange,
  CHANGE_KEYS,
  currentValue,
  type ChangeKey,
} from '../../src/core/remedy/apply-change.js';
import { filePatches, SERVING_ONLY } from '../../src/core/remedy/file-patch.js';
import type { Change } from '../../src/core/report/types.js';
import { applyServing } from '../../src/core/serving-patch.js';
import { checkpointConfig } from '../support/scenario-repo.js';

// A remedy that changes a serving setting of a checkpoint config tells the reader to write a key
// in the policy's `serving` block. The keys a checkpoint cannot hold and their policy spellings
// follow from the policy's own list of serving keys (SERVING_FIELDS) and the serving patch's
// field paths (SERVING_SPEC_PATH): these tests hold the derived table to what the policy reader
// accepts and to what the remedy proves.

/** One change per serving field, each valid on the test config (a group size needs a quantized format). */
const SERVING_CHANGES: Record<string, Change> = {
  'serving.span': { 'serving.span': 8192 },
  'serving.sequences': { 'serving.sequences': 4 },
  'dtypes.cache': { 'dtypes.cache': 'fp8' },
  'dtypes.positions': { 'dtypes.positions': 'fp32' },
  'serving.tensorParallel': { 'serving.tensorParallel': 2 },
  'serving.pipelineParallel': { 'serving.pipelineParallel': 2 },
  'dtypes.weights': { 'dtypes.weights': 'int8' },
  'quantization.groupSize': { 'dtypes.weights': 'int8', 'quantization.groupSize': 128 },
};

describe('SERVING_ONLY (fields a checkpoint config leaves to the policy)', () => {
  it('are the serving layout, the number formats and the quantization, and no field of the model itself', () => {
    expect([...SERVING_ONLY].sort()).toEqual(Object.keys(SERVING_CHANGES).sort());
    for (const key of ['position.base', 'position.scaling.factor', 'kvHeads'] as ChangeKey[])
      expect(SERVING_ONLY.has(key), key).toBe(false);
    for (const key of SERVING_ONLY) expect(CHANGE_KEYS).toContain(key);
  });

  const { spec, locations } = readModel(checkpointConfig(), 'models/a/config.json');

  it.each(Object.entries(SERVING_CHANGES))(
    '%s: the policy key the patch names sets, read by the policy reader, what the remedy proved',
    (key, change) => {
      const patches = filePatches(change, 'checkpoint', spec, locations, 'models/a/config.json');
      expect(patches.map((p) => p.target)).toEqual(['policy']);
      const patch = patches[0]!;
      expect(patch.format).toBe('yaml');
      for (const edit of patch.edits) expect(edit.key).toMatch(/^serving\.[a-z]+(-[a-z]+)*$/);
      // The snippet under the policy's top level, as a person pastes it.
      const policy = parsePolicy(`${patch.snippet}\n`, '.github/context-reach.yml');
      const served = applyServing(spec, locations, policy.serving, 'override', {
        key: 'policy serving',
        line: null,
      }).spec;
      const proved = applyChange(spec, change);
      expect(currentValue(served, key)).toBe(currentValue(proved, key));
      expect(currentValue(served, key)).not.toBe(currentValue(spec, key));
    },
  );
});
