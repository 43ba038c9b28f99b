import { EngineInputError } from '../diagnostics';

/** The load stages of the FVA 54 micropitting step test on the C-GF gear: 5 … 10 [memory]. */
export const MICROPITTING_STAGES = [5, 6, 7, 8, 9, 10] as const;
export const MICROPITTING_STAGE_MIN = 5;
export const MICROPITTING_STAGE_MAX = 10;

/** An oil's micropitting failure load stage SGF: 5 … 10, or '>10' (it passed stage 10). */
export type MicropittingFailureStage = number | '>10';

/**
 * The micropitting (GFT) classes as data sheets state them, and the stage each is read as: the
 * lowest stage of the class, the conservative reading. GFT-low: failure at stage 7 or below,
 * GFT-medium: 8–9, GFT-high: 10 or above [practice, no single source].
 */
export const GFT_CLASS_STAGE: Readonly<Record<'low' | 'medium' | 'high', number>> = { low: 5, medium: 8, high: 10 };

/**
 * The stage as a number for comparisons: 5 … 10, and '>10' as 11.
 *
 * @param stage - the failure stage, an integer 5 … 10 or '>10'
 * @param field - the review path for the message, e.g. `oils[1].micropittingFailureStage`
 * @throws EngineInputError naming the field when the stage is not a whole number 5 … 10 or '>10'
 * Source: FVA 54 micropitting test, load stages 5–10 [memory].
 */
export function micropittingStageNumber(stage: MicropittingFailureStage, field = 'micropittingFailureStage'): number {
  if (stage === '>10') return MICROPITTING_STAGE_MAX + 1;
  if (typeof stage === 'number' && Number.isInteger(stage) && stage >= MICROPITTING_STAGE_MIN && stage <= MICROPITTING_STAGE_MAX) return stage;
  throw new EngineInputError(
    'input.out-of-range',
    field,
    'integer 5…10 or >10',
    `${field} = ${JSON.stringify(stage)}: the micropitting failure load stage (FVA 54, C-GF gear) must be a whole number from 5 to 10, or ">10".`,
  );
}
