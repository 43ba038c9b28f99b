import type { ChangeFinding, ChangeSide } from '../../../app/review/results';
import { Fragment } from 'react';
import { CHANGE_WORDS } from '../../../app/review/vocabulary';
import { formatResult } from '../../units/format';

const n = (x: number | null, sig = 3) => (x === null ? '—' : formatResult(x, sig));
const pct = (x: number | null) => (x === null ? '—' : x < 1e-4 ? '< 0.01 %' : `${formatResult(100 * x, 2)} %`);
const stage = (s: number | '>12' | null) => (s === null ? '—' : s === '>12' ? 'above 12' : String(s));
const ICON = { supported: '✓', 'supported-with-conditions': '!', 'not-supported': '✗' } as const;

function Side({ s }: { readonly s: ChangeSide }) {
  return (
    <>
      <td>{n(s.scuffingSafety)}</td>
      <td>{n(s.integralSafety)}</td>
      <td>{n(s.lambdaMin)}</td>
      <td>{pct(s.scuffingProbability)}</td>
      <td>
        {stage(s.oilFzgStage)} / {stage(s.neededFzgStage)}
      </td>
    </>
  );
}

/** The change from the oil in service to a proposed oil: the finding, one sentence, conditions and before → after per case. */
export function ChangeCard({ change: ch }: { readonly change: ChangeFinding }) {
  return (
    <section className={`change change--${ch.finding}`} aria-label={`Change to ${ch.to}`} data-testid="change-finding" data-finding={ch.finding}>
      <header className="change__head">
        <span className="change__badge">
          <span aria-hidden="true">{ICON[ch.finding]}</span> {CHANGE_WORDS[ch.finding]}
        </span>
      </header>
      <p className="change__statement">{ch.statement}</p>
      {ch.conditions.length ? (
        <ul className="change__conditions" aria-label="Conditions">
          {ch.conditions.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      ) : null}
      <div className="table-scroll" tabIndex={0} role="region" aria-label="Before and after, per load case">
        <table className="change__table">
          <thead>
            <tr>
              <th scope="col">Load case</th>
              <th scope="col">Oil</th>
              <th scope="col">SB</th>
              <th scope="col">SintS</th>
              <th scope="col">λmin</th>
              <th scope="col">P(scuffing)</th>
              <th scope="col">FZG offered / needed</th>
            </tr>
          </thead>
          <tbody>
            {ch.byCase.map((b) => (
              <Fragment key={b.loadCase}>
                <tr>
                  <th scope="row" rowSpan={2}>
                    {b.loadCase}
                  </th>
                  <td>before</td>
                  <Side s={b.before} />
                </tr>
                <tr>
                  <td>after</td>
                  <Side s={b.after} />
                </tr>
              </Fragment>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
