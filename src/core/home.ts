import { VERSION } from './version.js';

/**
 * Where context-reach is published: the GitHub repository of the action (`owner/name`, the same
 * as package.json's `repository`, a test checks), and the major tag a release moves.
 */
export const ACTION_REPOSITORY = 'context-reach/context-reach';

/** The major tag of this release (`v1` for 1.x.y): what workflows name in `uses:`. */
export const MAJOR_TAG = `v${VERSION.split('.')[0]}`;

/** `uses:` value of the action in a workflow, at the major tag. */
export const ACTION_USES = `${ACTION_REPOSITORY}@${MAJOR_TAG}`;

/** Address of a published schema file (`policy.schema.json`, `report.schema.json`) at the major tag. */
export function schemaUrl(file: string): string {
  return `https://raw.githubusercontent.com/${ACTION_REPOSITORY}/${MAJOR_TAG}/schema/${file}`;
}
