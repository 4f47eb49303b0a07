import { ACTION_USES } from '../home.js';
import { DEFAULT_POLICY_PATH } from '../policy/defaults.js';

/** A workflow file `init` writes: repository-relative path and text. */
export interface WorkflowFile {
  path: string;
  text: string;
}

/** The `on: pull_request` trigger, limited to `paths` when given (null: every pull request). */
function trigger(paths: readonly string[] | null): string[] {
  if (paths === null) return ['on:', '  pull_request:'];
  return [
    'on:',
    '  pull_request:',
    `    paths: [${paths.map((p) => JSON.stringify(p)).join(', ')}]`,
  ];
}

/**
 * The workflow of the README's "Usage in a workflow": the gate on every pull request that
 * touches `paths`, commenting itself, with the HTML report uploaded. A test keeps the README's
 * snippet (under a `# <path>` line) equal to this text for `models/**`.
 */
export function simpleWorkflow(paths: readonly string[] | null): WorkflowFile {
  return {
    path: '.github/workflows/context-reach.yml',
    text: `${[
      'name: context-reach',
      ...trigger(paths),
      'permissions:',
      '  contents: read          # read both versions of the changed configs',
      '  pull-requests: write    # the one living comment',
      'concurrency:              # one run per pull request, so two runs never write the comment at once',
      '  group: context-reach-${{ github.event.pull_request.number }}',
      '  cancel-in-progress: true',
      'jobs:',
      '  gate:',
      '    runs-on: ubuntu-latest',
      '    steps:',
      '      - uses: actions/checkout@v4',
      '        with:',
      '          fetch-depth: 0  # both commits locally: no API calls for file contents',
      `      - uses: ${ACTION_USES}`,
      '        with:',
      `          policy: ${DEFAULT_POLICY_PATH}`,
      '          html-report: ${{ runner.temp }}/context-reach/report.html',
      '      - uses: actions/upload-artifact@v4   # the HTML report: charts, findings, proven remedies',
      '        if: always()                        # also when the gate fails the check',
      '        with:',
      '          name: context-reach-report',
      '          path: ${{ runner.temp }}/context-reach/report.html',
    ].join('\n')}\n`,
  };
}

/**
 * The two workflows of the README's "Pull requests from forks": the gate with the read-only
 * token, uploading its JSON report, and the publish workflow that posts the comment from it.
 * The project's own `.github/workflows/` holds exactly these for `models/**` (a test checks).
 */
export function forkWorkflows(paths: readonly string[] | null): WorkflowFile[] {
  const gate = [
    '# The gate on every pull request, forks included: it judges with the read-only token GitHub gives',
    '# a `pull_request` run and uploads its JSON report; context-reach-publish.yml posts the comment.',
    '# Nothing from the pull request is executed: the configs are read as data.',
    'name: context-reach',
    ...trigger(paths),
    'permissions:',
    '  contents: read          # both versions of the changed configs',
    '  pull-requests: read     # labels (the waiver) and, without history, the file list',
    'concurrency:              # one run per pull request: a newer push cancels the older run',
    '  group: context-reach-${{ github.event.pull_request.number }}',
    '  cancel-in-progress: true',
    'jobs:',
    '  gate:',
    '    runs-on: ubuntu-latest',
    '    steps:',
    '      - uses: actions/checkout@v4',
    '        with:',
    '          fetch-depth: 0              # both commits locally: contents from git, not the API',
    '          persist-credentials: false  # no token left in .git/config for later steps',
    `      - uses: ${ACTION_USES}`,
    '        with:',
    '          comment: off                # the publish workflow comments, on forks too',
    '          report-json: context-reach/report.json',
    '      - uses: actions/upload-artifact@v4',
    '        if: always()                  # also when the gate fails the check',
    '        with:',
    '          name: context-reach-json',
    '          path: context-reach/report.json',
  ];
  const publish = [
    '# Posts the report of context-reach.yml as the one pull-request comment, forks included. It runs',
    '# in the base repository with a token that may comment, so it checks out nothing and runs nothing',
    '# from the pull request: the report is untrusted data, checked and escaped again by the action,',
    "# and posted only to the open pull request whose head is the run's head commit.",
    'name: context-reach publish',
    'on:',
    '  workflow_run:',
    '    workflows: [context-reach]',
    '    types: [completed]',
    'permissions:',
    "  actions: read           # the first run's artifact",
    '  pull-requests: write    # the one living comment',
    'concurrency:              # one publish at a time per pull request (per head repository when GitHub names none)',
    '  group: context-reach-publish-${{ github.event.workflow_run.pull_requests[0].number || github.event.workflow_run.head_repository.id }}',
    '  cancel-in-progress: false',
    'jobs:',
    '  publish:',
    "    if: github.event.workflow_run.event == 'pull_request'",
    '    runs-on: ubuntu-latest',
    '    steps:',
    '      - uses: actions/download-artifact@v4',
    '        with:',
    '          name: context-reach-json',
    '          path: context-reach-json',
    '          run-id: ${{ github.event.workflow_run.id }}',
    '          github-token: ${{ github.token }}',
    `      - uses: ${ACTION_USES}`,
    '        with:',
    '          publish-report: context-reach-json/report.json',
  ];
  return [
    { path: '.github/workflows/context-reach.yml', text: `${gate.join('\n')}\n` },
    { path: '.github/workflows/context-reach-publish.yml', text: `${publish.join('\n')}\n` },
  ];
}
