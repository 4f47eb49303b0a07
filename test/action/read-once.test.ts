import { describe, expect, it } from 'vitest';
import { parseNameStatus, parseRawDiff } from '../../src/adapters/git.js';

// Issue 16: parseRawDiff reads git's raw diff output into the files parseNameStatus gives, with
// each side's mode and blob id. The runs that count git processes over pull requests of 300
// configs are in read-once.slow.test.ts (`npm run test:full`).

describe('parseRawDiff(output)', () => {
  const ID = (c: string) => c.repeat(40);
  it("gives the files parseNameStatus gives, with each side's mode and blob id", () => {
    const raw = [
      `:100644 100644 ${ID('a')} ${ID('b')} M`,
      'm.json',
      `:000000 100644 ${ID('0')} ${ID('c')} A`,
      'a.json',
      `:100644 000000 ${ID('d')} ${ID('0')} D`,
      'd.json',
      `:100644 120000 ${ID('e')} ${ID('f')} T`,
      't.json',
      `:100755 100644 ${ID('1')} ${ID('2')} R091`,
      'old.json',
      'new.json',
      `:100644 100644 ${ID('3')} ${ID('3')} C100`,
      'src.json',
      'copy.json',
      '',
    ].join('\u0000');
    const records = parseRawDiff(raw);
    expect(records.map((r) => r.file)).toEqual(
      parseNameStatus(
        [
          'M',
          'm.json',
          'A',
          'a.json',
          'D',
          'd.json',
          'T',
          't.json',
          'R091',
          'old.json',
          'new.json',
          'C100',
          'src.json',
          'copy.json',
          '',
        ].join('\u0000'),
      ),
    );
    expect(records[0]).toMatchObject({
      basePath: 'm.json',
      baseEntry: { kind: 'file', oid: ID('a') },
      headEntry: { kind: 'file', oid: ID('b') },
    });
    expect(records[1]).toMatchObject({
      basePath: null,
      baseEntry: null,
      headEntry: { oid: ID('c') },
    });
    expect(records[2]).toMatchObject({
      basePath: 'd.json',
      baseEntry: { oid: ID('d') },
      headEntry: null,
    });
    expect(records[3]!.headEntry).toMatchObject({ kind: 'symlink', mode: '120000' });
    expect(records[4]).toMatchObject({
      basePath: 'old.json',
      baseEntry: { mode: '100755', oid: ID('1') },
      headEntry: { oid: ID('2') },
    });
    expect(records[5]).toMatchObject({
      basePath: null,
      baseEntry: null,
      headEntry: { oid: ID('3') },
    });
  });

  it('refuses a header that is not a raw record and a record cut short', () => {
    expect(() => parseRawDiff('M\u0000a.json\u0000')).toThrow(/not "<modes> <ids> <status>"/);
    expect(() =>
      parseRawDiff(`:100644 100644 ${ID('a')} ${ID('b')} R100\u0000a.json\u0000`),
    ).toThrow(/ends inside/);
  });
});
