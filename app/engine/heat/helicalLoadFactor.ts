/**
 * Helical load factor KBγ of the ISO/TS 6336-20 flash temperature method (as DIN 3990-4) [memory]:
 * εγ ≤ 2: 1; 2 < εγ < 3.5: 1 + 0.2 √((εγ − 2)(5 − εγ)); εγ ≥ 3.5: 1.3.
 * Continuous at both ends (εγ = 3.5 gives 1 + 0.2·√2.25 = 1.3).
 * @param totalContactRatio - εγ = εα + εβ
 */
export function helicalLoadFactor(totalContactRatio: number): number {
  const e = totalContactRatio;
  if (e <= 2) return 1;
  if (e >= 3.5) return 1.3;
  return 1 + 0.2 * Math.sqrt((e - 2) * (5 - e));
}
