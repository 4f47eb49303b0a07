// Prints the CHANGELOG.md section of one version (the release notes of its tag):
// `node scripts/changelog-notes.mjs 1.0.0 [CHANGELOG.md]`. Exit 1, naming the version, when the
// changelog has no section for it or the section is empty.
import { readFileSync } from 'node:fs';
import { pathToFileURL } from 'node:url';

/** The body of `## [version]` up to the next `## ` heading or link definitions, trimmed; null when absent. */
export function releaseNotes(changelog, version) {
  const lines = changelog.split(/\r?\n/);
  const escaped = version.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const start = lines.findIndex((line) => new RegExp(`^## \\[${escaped}\\](\\s|$)`).test(line));
  if (start < 0) return null;
  const body = [];
  for (const line of lines.slice(start + 1)) {
    if (/^## /.test(line) || /^\[[^\]]+\]: /.test(line)) break;
    body.push(line);
  }
  const text = body.join('\n').trim();
  return text === '' ? null : `${text}\n`;
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? '').href) {
  const [version, file = 'CHANGELOG.md'] = process.argv.slice(2);
  const notes = version
    ? releaseNotes(readFileSync(file, 'utf8'), version.replace(/^v/, ''))
    : null;
  if (!version) {
    console.error('usage: node scripts/changelog-notes.mjs VERSION [CHANGELOG.md]');
    process.exitCode = 2;
  } else if (notes === null) {
    console.error(
      `${file} has no section "## [${version.replace(/^v/, '')}]" with notes; add it before tagging`,
    );
    process.exitCode = 1;
  } else {
    process.stdout.write(notes);
  }
}
