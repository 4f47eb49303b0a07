/**
 * The I/O floor of W6 (issue 16), run as its own node process from the repository folder:
 * `git diff --name-status -z BASE HEAD`, then ONE `git cat-file --batch` of every changed file
 * at base and at head (`<commit>:<path>`), then `JSON.parse` of each JSON blob (YAML blobs are
 * decoded to text only). Prints the number of blobs read. No judging: what any gate must do.
 */
import { execFileSync } from 'node:child_process';

const [base, head] = process.argv.slice(2);
if (!base || !head) throw new Error('usage: node io-floor.js BASE HEAD');
const fields = execFileSync('git', ['diff', '--name-status', '-M', '-z', base, head, '--'], {
  maxBuffer: 1 << 30,
})
  .toString('utf8')
  .split('\u0000');
const names: string[] = [];
for (let i = 0; i + 1 < fields.length;) {
  const letter = fields[i]!.charAt(0);
  if (letter === 'R' || letter === 'C') {
    names.push(`${base}:${fields[i + 1]}`, `${head}:${fields[i + 2]}`);
    i += 3;
  } else {
    if (letter !== 'A') names.push(`${base}:${fields[i + 1]}`);
    if (letter !== 'D') names.push(`${head}:${fields[i + 1]}`);
    i += 2;
  }
}
const out = execFileSync('git', ['cat-file', '--batch'], {
  input: `${names.join('\n')}\n`,
  maxBuffer: 1 << 30,
});
let at = 0;
let blobs = 0;
const decoder = new TextDecoder();
for (const name of names) {
  const end = out.indexOf(0x0a, at);
  const size = Number(out.toString('utf8', at, end).split(' ')[2]);
  const text = decoder.decode(out.subarray(end + 1, end + 1 + size));
  if (name.endsWith('.json')) JSON.parse(text);
  at = end + 1 + size + 1;
  blobs += 1;
}
process.stdout.write(`${blobs}\n`);
