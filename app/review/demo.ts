import crusher from '../../assets/demo/harrow-creek-crusher-hs-pair.flankfilm.json';
import conveyor from '../../assets/demo/harrow-creek-conveyor-spur-pair.flankfilm.json';
import ballMill from '../../assets/demo/harrow-creek-ball-mill-planetary.flankfilm.json';

/** The invented demo scenario (see NAMES.md: Harrow Creek aggregate plant), keyed by file name. */
export const DEMO_REVIEWS: Readonly<Record<string, unknown>> = {
  'harrow-creek-crusher-hs-pair.flankfilm.json': crusher,
  'harrow-creek-conveyor-spur-pair.flankfilm.json': conveyor,
  'harrow-creek-ball-mill-planetary.flankfilm.json': ballMill,
};

/** The demo reviews' ids start so; a review with such an id is the invented demo, and the sheet says so once. */
export const DEMO_ID_PREFIX = 'HC-DEMO-';
export const isDemoReview = (draft: { readonly id?: unknown }): boolean => typeof draft.id === 'string' && draft.id.startsWith(DEMO_ID_PREFIX);
