/** Said in every report: what the numbers are and are not. */
export const ESTIMATE_NOTICE =
  'These metrics are estimates computed from the config alone, to support a review; they are not a guarantee of model quality, and a model can fail or succeed for reasons no config shows.';

/** Hidden first line of the pull-request comment; the action finds its own comment by it. */
export const COMMENT_MARKER = '<!-- context-reach:pull-request-report -->';
