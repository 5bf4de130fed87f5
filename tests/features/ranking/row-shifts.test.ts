import { describe, expect, it } from 'vitest';
import { rowShifts } from '@/features/ranking/hooks/use-row-shifts';

// The ranking table shows a new order by shifting rows (translateY) from their place in the document;
// the shift is the row's top in the shown order minus its top in the document order, both summed
// from the rows' heights (hand computations below).
describe('rowShifts: from the document order to the shown order, from heights alone', () => {
  it('is zero for every row when the orders agree', () => {
    expect(rowShifts(['a', 'b', 'c'], ['a', 'b', 'c'], [10, 20, 30])).toEqual([0, 0, 0]);
  });

  it('swaps two rows of different heights', () => {
    // document a(10) b(20) c(30): tops 0, 10, 30. shown b, a, c: tops b 0, a 20, c 30.
    // shifts: a 20 − 0 = 20, b 0 − 10 = −10, c 30 − 30 = 0.
    expect(rowShifts(['a', 'b', 'c'], ['b', 'a', 'c'], [10, 20, 30])).toEqual([20, -10, 0]);
  });

  it('reverses the order', () => {
    // document a(10) b(20) c(30): tops 0, 10, 30. shown c, b, a: tops c 0, b 30, a 50.
    expect(rowShifts(['a', 'b', 'c'], ['c', 'b', 'a'], [10, 20, 30])).toEqual([50, 20, -30]);
  });

  it('is null while a row’s height is not known (the rows are then re-ordered in the document)', () => {
    expect(rowShifts(['a', 'b'], ['b', 'a'], [10, undefined])).toBeNull();
  });
});
