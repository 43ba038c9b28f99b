import { parseReviewValue } from '../../app/review/parse';
import type { Review } from '../../app/review/schema';

/**
 * A review of the FZG type A test gear (ISO 14635-1: z 16/24, m 4.5 mm, a 91.5 mm, b 20 mm,
 * x1 0.8532, x2 −0.5, da 88.77/112.5 mm [src: Höhn et al. 2008, Table 1]) at its test speed
 * (2170 rpm, A/8.3/90) and 90 °C, dip lubricated, with the given load cases, oils and policy.
 */
export function fzgTypeAReview(loadCases: ReadonlyArray<{ name: string; pinionTorque_Nm: number; timeShare?: number }>, oils: unknown[], policy: Record<string, unknown>): Review {
  const p = parseReviewValue({
    format: 'flankfilm.review',
    version: 1,
    title: 'FZG type A test gear (ISO 14635-1)',
    gearPair: {
      normalModule_mm: 4.5,
      faceWidth_mm: 20,
      centerDistance_mm: 91.5,
      pinion: { teeth: 16, profileShift: 0.8532, tipDiameter_mm: 88.77, roughnessRa_um: 0.3, material: 'steel-carburized' },
      wheel: { teeth: 24, profileShift: -0.5, tipDiameter_mm: 112.5, roughnessRa_um: 0.3, material: 'steel-carburized' },
    },
    loadCases: loadCases.map((c) => ({ pinionSpeed_rpm: 2170, oilTemperature_C: 90, lubrication: 'dip', ...c })),
    oils,
    policy,
  });
  if (!p.ok) throw new Error(JSON.stringify(p.issues));
  return p.review;
}
