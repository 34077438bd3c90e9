import { describe, expect, it } from 'vitest';
import { TABLE_EMPTY_MESSAGE, tableCellNumber, tableNumbers } from '../../../src/lib/tools/table-cells';

describe('tableCellNumber', () => {
  it('reads plain, signed and exponent numbers', () => {
    expect(tableCellNumber(' 12.5 ').value).toBe(12.5);
    expect(tableCellNumber('-3').value).toBe(-3);
    expect(tableCellNumber('1.2e-3').value).toBe(0.0012);
  });

  it('reads a decimal comma when there is no dot', () => {
    expect(tableCellNumber('3,5').value).toBe(3.5);
  });

  it('names text that is not a number', () => {
    const r = tableCellNumber('abc');
    expect(r.value).toBeNull();
    expect(r.problem).toBe('“abc” is not a number');
  });

  it('gives null and no problem for a blank cell', () => {
    expect(tableCellNumber('  ')).toEqual({ value: null, problem: null });
  });
});

describe('tableNumbers', () => {
  it('skips blank rows but keeps the row indexes of the rest', () => {
    const r = tableNumbers(
      [
        { a: '1', b: '2' },
        { a: '', b: '' },
        { a: '3', b: '4' },
      ],
      ['a', 'b'],
    );
    expect(r.rowIndexes).toEqual([0, 2]);
    expect(r.values).toEqual([
      [1, 2],
      [3, 4],
    ]);
    expect(r.errors).toEqual({});
  });

  it('keys problems by row and column, and lets optional columns be blank', () => {
    const r = tableNumbers(
      [
        { a: 'x', b: '' },
        { a: '', b: '5', c: '' },
      ],
      ['a', 'b', 'c'],
      ['c'],
    );
    expect(r.errors).toEqual({ '0.a': '“x” is not a number', '0.b': 'enter a number', '1.a': 'enter a number' });
  });

  it('reports an empty table under "table"', () => {
    expect(tableNumbers([{ a: '' }], ['a']).errors).toEqual({ table: TABLE_EMPTY_MESSAGE });
  });
});
