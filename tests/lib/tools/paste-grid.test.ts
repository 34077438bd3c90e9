import { describe, expect, it } from 'vitest';
import { pasteGridApply, pasteGridParse } from '../../../src/lib/tools/paste-grid';

describe('pasteGridParse', () => {
  it('splits spreadsheet clipboard text on tabs and newlines', () => {
    expect(pasteGridParse('1\t2\r\n3\t4\n\n')).toEqual([
      ['1', '2'],
      ['3', '4'],
    ]);
  });

  it('splits CSV text on commas when there are no tabs or semicolons', () => {
    expect(pasteGridParse('1,2\n3,4')).toEqual([
      ['1', '2'],
      ['3', '4'],
    ]);
  });
});

describe('pasteGridApply', () => {
  const keys = ['a', 'b'];

  it('writes from the pasted cell rightwards and downwards, adding rows', () => {
    const rows = pasteGridApply(
      [{ a: '', b: '' }],
      [
        ['1', '2'],
        ['3', '4'],
      ],
      0,
      0,
      keys,
    );
    expect(rows).toEqual([
      { a: '1', b: '2' },
      { a: '3', b: '4' },
    ]);
  });

  it('drops cells beyond the last column and leaves the input rows unchanged', () => {
    const input = [{ a: 'x', b: 'y' }];
    const rows = pasteGridApply(input, [['7', '8', '9']], 0, 1, keys);
    expect(rows).toEqual([{ a: 'x', b: '7' }]);
    expect(input).toEqual([{ a: 'x', b: 'y' }]);
  });

  it('skips a header row pasted into the first row', () => {
    const rows = pasteGridApply(
      [],
      [
        ['time', 'x'],
        ['0', '1'],
      ],
      0,
      0,
      keys,
    );
    expect(rows).toEqual([{ a: '0', b: '1' }]);
  });
});
