/**
 * Typed columns of one length carved, one after another, from a single ArrayBuffer. Allocating a
 * typed array costs about as much as filling some hundred numbers (a backing store of its own,
 * which the collector tracks), and a recompute wants some two hundred columns; a view on one buffer
 * per group costs a fraction of that. The columns are independent arrays to their readers; they
 * only share their buffer (so moving one buffer to another thread moves its whole group).
 */
export class ColumnBlock {
  private readonly buffer: ArrayBuffer;
  private offset = 0;

  /** Room for `float64` columns of Float64 and then `uint8` columns of Uint8, each `n` long. */
  constructor(
    private readonly n: number,
    float64: number,
    uint8 = 0,
  ) {
    this.buffer = new ArrayBuffer(n * (8 * float64 + uint8));
  }

  float64(): Float64Array {
    return new Float64Array(this.buffer, this.take(8), this.n);
  }

  uint8(): Uint8Array {
    return new Uint8Array(this.buffer, this.take(1), this.n);
  }

  private take(bytesPerItem: number): number {
    const at = this.offset;
    const end = at + bytesPerItem * this.n;
    // Float64 columns come first, so every one starts on an 8-byte boundary.
    if (end > this.buffer.byteLength || (bytesPerItem === 8 && at % 8 !== 0)) throw new RangeError(`ColumnBlock: no room for another column of ${bytesPerItem}-byte items`);
    this.offset = end;
    return at;
  }
}
