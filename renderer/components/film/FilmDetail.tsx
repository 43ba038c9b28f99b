import { useEffect, useMemo, useRef } from 'react';
import type { EhlPointResult } from '../../../app/review/ehlAtPoint';
import type { EhlPointRequest } from '../../../app/review/ehlPoint';
import type { Review } from '../../../app/review/schema';
import { useFilmDetail } from '../../hooks/useFilmDetail';
import { formatResult } from '../../units/format';
import { toDisplay, unitLabel, type QuantityKind, type UnitSystem } from '../../units/units';
import { trapTab } from '../focusTrap';
import { FilmChart } from './FilmChart';
import { filmChartSpec } from './filmChart';
import { messageInWords, pathsInWords } from '../../../app/review/pathWords';

interface Props {
  readonly review: Review;
  readonly point: EhlPointRequest;
  readonly units: UnitSystem;
  readonly onClose: () => void;
}

function Figure({ label, kind, value, units, testId }: { label: string; kind: QuantityKind; value: number; units: UnitSystem; testId?: string }) {
  return (
    <div className="qrow">
      <dt>{label}</dt>
      <dd data-testid={testId} data-value={value}>
        {formatResult(toDisplay(kind, value, units), 3)} {unitLabel(kind, units)}
      </dd>
    </div>
  );
}

function Solved({ r, units }: { r: EhlPointResult; units: UnitSystem }) {
  const spec = useMemo(() => filmChartSpec(r, units), [r, units]);
  const described = `${spec.title}: numerical pressure and film across the contact, with the composite roughness band, the anti-wear tribofilm band (common practice) and the formula's minimum film as a line. ${r.inWords}`;
  return (
    <>
      <p className="note" data-testid="film-status" data-converged={r.converged}>
        {r.converged
          ? `Converged in ${r.iterations} iterations on ${r.nodes} nodes, ${formatResult(r.ms, 2)} ms in a worker.`
          : `Did not converge after ${r.iterations} iterations (last residual ${r.residual.toExponential(1)}): the figures are provisional.`}
      </p>
      <h3 className="film-chart__title">{spec.title}</h3>
      <FilmChart spec={spec} described={described} />
      <dl className="qlist qlist--row">
        <Figure label="Minimum film, numerical" kind="film" value={r.hMin_um} units={units} testId="film-hmin" />
        <Figure label={`Minimum film, ${r.formulaName}`} kind="film" value={r.formulaHMin_um} units={units} testId="film-formula-hmin" />
        <Figure label="Central film, numerical" kind="film" value={r.hCentral_um} units={units} />
        <Figure label="Composite roughness" kind="roughness" value={r.compositeRoughness_um} units={units} testId="film-roughness" />
        <Figure label="Peak pressure" kind="stress" value={r.pMax_MPa} units={units} />
        <Figure label="Hertz pressure" kind="stress" value={r.hertzP0_MPa} units={units} />
      </dl>
      <p data-testid="film-words">{r.inWords}</p>
      {r.warnings.length ? (
        <ul className="notes" data-testid="film-notes">
          {r.warnings.map((w) => (
            <li key={w.code}>{pathsInWords(w.message)}</li>
          ))}
        </ul>
      ) : null}
      <p className="note">
        Isothermal solution at the bulk temperature {formatResult(toDisplay('temperature', r.filmTemperature_C, units), 3)} {unitLabel('temperature', units)}
        {r.thermalFactor < 1 ? `; the formula's film includes the inlet shear-heating factor ${formatResult(r.thermalFactor, 3)}` : ''}. A cross-check at one point, not a replacement for the path
        calculation; the gearbox maker&apos;s lubricant list and licensed engineering judgement decide.
      </p>
    </>
  );
}

/** Film detail: the numerical film and pressure at one point, solved in a worker. */
export function FilmDetail({ review, point, units, onClose }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const state = useFilmDetail(review, point);
  useEffect(() => {
    if (ref.current && !ref.current.open) ref.current.showModal();
  }, []);
  return (
    <dialog ref={ref} className="dialog dialog--wide" aria-labelledby="film-title" onClose={onClose} onKeyDown={trapTab} data-testid="film-detail" data-phase={state.phase}>
      <h2 id="film-title">Film detail</h2>
      <p>
        {point.caseName} — {point.oilName ?? review.oils[0]?.name}
      </p>
      {state.phase === 'done' ? <Solved r={state.result} units={units} /> : null}
      {state.phase === 'running' || state.phase === 'idle' ? <p className="note" role="status">Solving the film…</p> : null}
      {state.phase === 'failed' ? <p className="problem" role="alert">{messageInWords(state.message, review, units)}</p> : null}
      <div className="dialog__buttons">
        <button type="button" className="primary" onClick={() => ref.current?.close()}>Close</button>
      </div>
    </dialog>
  );
}
