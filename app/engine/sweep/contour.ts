/** A segment in grid coordinates: column and row as fractional indices. */
export interface Segment {
  readonly c0: number;
  readonly r0: number;
  readonly c1: number;
  readonly r1: number;
}

/**
 * The iso-line `value = level` of a grid (marching squares, with linear interpolation on the cell
 * edges; saddles split by the centre value). `at(r, c)` gives the value at row r, column c; +∞ is
 * allowed (it lies above any level). Used for the SB = SB,min and λ = target lines of the map.
 */
export function contourSegments(rows: number, cols: number, at: (r: number, c: number) => number, level: number): Segment[] {
  const out: Segment[] = [];
  const v = (r: number, c: number) => {
    const x = at(r, c);
    return Number.isFinite(x) ? x : x > 0 ? Number.MAX_VALUE : -Number.MAX_VALUE;
  };
  // Where on the edge between values a and b the level falls (0…1).
  const t = (a: number, b: number) => {
    const d = b - a;
    if (d === 0 || !Number.isFinite(d)) return 0.5;
    const x = (level - a) / d;
    return x < 0 ? 0 : x > 1 ? 1 : x;
  };
  for (let r = 0; r < rows - 1; r++) {
    for (let c = 0; c < cols - 1; c++) {
      const a = v(r, c), b = v(r, c + 1), d = v(r + 1, c), e = v(r + 1, c + 1);
      const idx = (a >= level ? 8 : 0) | (b >= level ? 4 : 0) | (e >= level ? 2 : 0) | (d >= level ? 1 : 0);
      if (idx === 0 || idx === 15) continue;
      // Edge points: top (a–b), right (b–e), bottom (d–e), left (a–d).
      const top = { c: c + t(a, b), r };
      const right = { c: c + 1, r: r + t(b, e) };
      const bottom = { c: c + t(d, e), r: r + 1 };
      const left = { c, r: r + t(a, d) };
      const seg = (p: { c: number; r: number }, q: { c: number; r: number }) => out.push({ c0: p.c, r0: p.r, c1: q.c, r1: q.r });
      switch (idx) {
        case 1: case 14: seg(left, bottom); break;
        case 2: case 13: seg(bottom, right); break;
        case 3: case 12: seg(left, right); break;
        case 4: case 11: seg(top, right); break;
        case 6: case 9: seg(top, bottom); break;
        case 7: case 8: seg(left, top); break;
        case 5: case 10: {
          const centre = (a + b + d + e) / 4 >= level;
          if ((idx === 5) === centre) { seg(left, top); seg(bottom, right); } else { seg(left, bottom); seg(top, right); }
          break;
        }
      }
    }
  }
  return out;
}
