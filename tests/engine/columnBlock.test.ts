import { describe, expect, it } from 'vitest';
import { ColumnBlock } from '../../app/engine/columnBlock';

describe('ColumnBlock', () => {
  it('gives independent columns of the length asked for, on one buffer', () => {
    const block = new ColumnBlock(5, 2, 1);
    const a = block.float64();
    const b = block.float64();
    const c = block.uint8();
    a.fill(1);
    b.fill(2);
    c.fill(3);
    expect([...a]).toEqual([1, 1, 1, 1, 1]);
    expect([...b]).toEqual([2, 2, 2, 2, 2]);
    expect([...c]).toEqual([3, 3, 3, 3, 3]);
    expect(a.buffer).toBe(b.buffer);
    expect(c.buffer).toBe(a.buffer);
    expect(a.buffer.byteLength).toBe(5 * (8 * 2 + 1));
  });

  it('refuses a column more than it has room for, and a Float64 column after a Uint8 one breaks alignment', () => {
    const full = new ColumnBlock(4, 1);
    full.float64();
    expect(() => full.float64()).toThrow(RangeError);
    const mixed = new ColumnBlock(3, 1, 1);
    mixed.uint8();
    expect(() => mixed.float64()).toThrow(RangeError);
  });

  it('an empty path gives empty columns', () => {
    const block = new ColumnBlock(0, 3, 1);
    expect(block.float64().length).toBe(0);
    expect(block.uint8().length).toBe(0);
  });
});
