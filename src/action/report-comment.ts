/**
 * The living report comment: one comment per pull request, found by its marker, edited in place
 * on every run, and converged back to one when runs at the same time each wrote one. The calls
 * themselves are the REST adapter's (`src/adapters/github-rest.ts`).
 */
import {
  ApiError,
  isNotFoundError,
  type Comment,
  type GitHubClient,
} from '../adapters/github-rest.js';

/** Whether a failed call may still have taken effect: no answer, or a server error. */
function outcomeUnknown(error: unknown): boolean {
  return error instanceof ApiError && (error.status === 0 || error.status >= 500);
}

/** Tries to create a comment at most this many times when the answers are lost, as the retry plugin would (1 + 3 retries). */
const CREATE_ATTEMPTS = 4;

/** What a duplicate report comment becomes when it cannot be deleted: no marker, so no run takes it for the report. */
export function supersededBody(url: string): string {
  return `_This report was replaced by [the current context-reach report](${url}); runs at the same time wrote two._`;
}

/**
 * Keeps exactly one report comment: updates the one found by `marker`, creates one when there
 * is none or the found one is gone (404, or 422 when a fresh read confirms it is gone). Then it
 * converges: two runs at once may each have created one, so every marked comment of the same
 * author is listed, the oldest is kept with this run's body and the others are deleted (or,
 * when deleting is refused, lose the marker and point to the one kept).
 */
export async function publishComment(
  client: GitHubClient,
  target: { owner: string; repo: string; issueNumber: number; marker: string; body: string },
): Promise<{ comment: Comment; action: 'created' | 'updated' }> {
  const written = await writeComment(client, target);
  const { owner, repo, issueNumber, marker, body } = target;
  const login = (await client.identity()) ?? written.comment.author;
  if (login === null) return written;
  const all = await client.listMarkedComments(owner, repo, issueNumber, marker, login);
  if (all.length <= 1) return written;
  const [oldest, ...others] = all as [Comment, ...Comment[]];
  const kept =
    oldest.id === written.comment.id
      ? written.comment
      : await client.updateComment(owner, repo, oldest.id, body);
  for (const other of others) {
    try {
      await client.deleteComment(owner, repo, other.id);
    } catch {
      await client
        .updateComment(owner, repo, other.id, supersededBody(kept.url))
        .catch(() => undefined);
    }
  }
  return { comment: kept, action: written.action };
}

async function writeComment(
  client: GitHubClient,
  target: { owner: string; repo: string; issueNumber: number; marker: string; body: string },
): Promise<{ comment: Comment; action: 'created' | 'updated' }> {
  const { owner, repo, issueNumber, marker, body } = target;
  const existing = await client.findComment(owner, repo, issueNumber, marker);
  if (existing) {
    try {
      return {
        comment: await client.updateComment(owner, repo, existing.id, body),
        action: 'updated',
      };
    } catch (error) {
      if (!(error instanceof ApiError)) throw error;
      const gone =
        isNotFoundError(error) ||
        (error.status === 422 && (await client.getComment(owner, repo, existing.id)) === null);
      if (!gone) throw error;
    }
  }
  // A create whose answer was lost may have landed: look for it before trying again, so a
  // dropped connection never leaves two report comments.
  for (let attempt = 1; ; attempt += 1) {
    try {
      return {
        comment: await client.createComment(owner, repo, issueNumber, body),
        action: 'created',
      };
    } catch (error) {
      if (!outcomeUnknown(error) || attempt >= CREATE_ATTEMPTS) throw error;
    }
    const landed = await client.findComment(owner, repo, issueNumber, marker);
    if (landed) {
      const comment =
        landed.body === body ? landed : await client.updateComment(owner, repo, landed.id, body);
      return { comment, action: 'created' };
    }
  }
}
