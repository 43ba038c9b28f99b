import { VERDICT_COLOURS, VERDICT_WORDS } from '../../../app/review/vocabulary';
import type { VerdictCode } from '../../../app/review/results';
import { levelText } from './mapView';
import { VerdictIcon } from '../VerdictBadge';

interface Props {
  readonly scuffingSafetyMin: number;
  readonly lambdaTarget: number;
  /** The case's own point, in words (its temperature as shown). */
  readonly casePoint: string;
}

const CODES: readonly VerdictCode[] = ['aw-suffices', 'ep-warranted', 'beyond-oil'];

/** Each cell colour with its word and shape, and what the lines and the ring mean. */
export function MapLegend({ scuffingSafetyMin, lambdaTarget, casePoint }: Props) {
  return (
    <ul className="map-legend" aria-label="Legend of the operating maps">
      {CODES.map((code) => (
        <li key={code} data-verdict={code}>
          <span className={`map-legend__swatch map-legend__swatch--${code}`} style={{ borderColor: VERDICT_COLOURS[code] }} aria-hidden="true">
            <VerdictIcon code={code} size={14} />
          </span>
          {VERDICT_WORDS[code]}
        </li>
      ))}
      <li>
        <svg width="28" height="10" aria-hidden="true" className="map-legend__line"><line x1="1" y1="5" x2="27" y2="5" className="map-legend__sb" /></svg>
        SB = SB,min = {levelText(scuffingSafetyMin)} (solid line)
      </li>
      <li>
        <svg width="28" height="10" aria-hidden="true" className="map-legend__line"><line x1="1" y1="5" x2="27" y2="5" className="map-legend__lambda" /></svg>
        λmin = λ target = {levelText(lambdaTarget)} (dashed line)
      </li>
      <li>
        <svg width="28" height="10" aria-hidden="true" className="map-legend__line"><line x1="1" y1="5" x2="27" y2="5" className="map-legend__micropitting" /></svg>
        λGF,min = λGFP, the micropitting limit of each oil whose micropitting stage is given (dotted line)
      </li>
      <li>
        <svg width="28" height="18" aria-hidden="true" className="map-legend__line"><circle cx="14" cy="9" r="6" className="map-legend__ring" /></svg>
        this load case: {casePoint}
      </li>
    </ul>
  );
}
