import type { VerdictCode } from '../../app/review/results';
import { VERDICT_WORDS } from '../../app/review/vocabulary';

/** The shape that goes with each verdict colour, so colour is never alone: circle with a tick, triangle with a bar, octagon with a cross. */
export function VerdictIcon({ code, size = 18 }: { readonly code: VerdictCode; readonly size?: number }) {
  return (
    <svg className={`vicon vicon--${code}`} width={size} height={size} viewBox="0 0 20 20" aria-hidden="true" focusable="false">
      {code === 'aw-suffices' ? (
        <>
          <circle cx="10" cy="10" r="9" className="vicon__fill" />
          <path d="M5.5 10.5l3 3 6-7" className="vicon__mark" />
        </>
      ) : code === 'ep-warranted' ? (
        <>
          <path d="M10 1.5l9 16.5H1z" className="vicon__fill" />
          <path d="M10 7v5.5M10 15v.5" className="vicon__mark" />
        </>
      ) : (
        <>
          <path d="M6.3 1h7.4L19 6.3v7.4L13.7 19H6.3L1 13.7V6.3z" className="vicon__fill" />
          <path d="M6.5 6.5l7 7M13.5 6.5l-7 7" className="vicon__mark" />
        </>
      )}
    </svg>
  );
}

/** The verdict: icon, word and colour band together. */
export function VerdictBadge({ code, compact }: { readonly code: VerdictCode; readonly compact?: boolean }) {
  return (
    <span className={`vbadge vbadge--${code}${compact ? ' vbadge--compact' : ''}`} data-verdict={code}>
      <VerdictIcon code={code} />
      <span className="vbadge__word">{VERDICT_WORDS[code]}</span>
    </span>
  );
}
