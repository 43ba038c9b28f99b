import { memo, useEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import type { OperatingMapResult } from '../../../app/review/operatingMaps';
import { OKABE_ITO } from '../../../app/review/vocabulary';
import { cssVar, useColorScheme } from '../../hooks/useColorScheme';
import type { UnitSystem } from '../../units/units';
import { cellAt, drawHeatMap, type Palette } from './drawHeatMap';
import { casePoint, chainSegments, clampCell, mapContours, mapSummary, type Cell } from './mapView';

interface Props {
  readonly map: OperatingMapResult;
  /** How the panel names this oil. */
  readonly label: string;
  readonly scuffingSafetyMin: number;
  readonly lambdaTarget: number;
  readonly caseTemperature_C: number;
  readonly units: UnitSystem;
  /** Shared by the maps of a case: the same cell is outlined on each. */
  readonly cursor: Cell | null;
  readonly onCursor: (cell: Cell) => void;
  readonly readoutId: string;
}

const MOVES: Readonly<Record<string, Cell>> = { ArrowUp: { r: 1, c: 0 }, ArrowDown: { r: -1, c: 0 }, ArrowRight: { r: 0, c: 1 }, ArrowLeft: { r: 0, c: -1 } };

function palette(dark: boolean): Palette {
  return {
    fg: cssVar('--fg') || (dark ? '#e9e8e3' : '#1d1d1b'),
    muted: cssVar('--muted') || '#5b5a55',
    surface: cssVar('--surface') || (dark ? '#1f2120' : '#ffffff'),
    line: cssVar('--line') || '#d5d3cc',
    lambda: dark ? OKABE_ITO.skyBlue : OKABE_ITO.blue,
    dark,
  };
}

/** One oil's operating map on a canvas, with a cell cursor for the pointer and the arrow keys. */
function HeatMapView({ map, label, scuffingSafetyMin, lambdaTarget, caseTemperature_C, units, cursor, onCursor, readoutId }: Props) {
  const box = useRef<HTMLDivElement>(null);
  const canvas = useRef<HTMLCanvasElement>(null);
  const [width, setWidth] = useState(0);
  const scheme = useColorScheme();
  const height = Math.round(Math.min(420, Math.max(240, width * 0.7)));
  const contours = useMemo(() => {
    const { sb, lambda, micropitting } = mapContours(map, scuffingSafetyMin, lambdaTarget);
    return { sb: chainSegments(sb), lambda: chainSegments(lambda), micropitting: chainSegments(micropitting) };
  }, [map, scuffingSafetyMin, lambdaTarget]);
  const point = useMemo(() => casePoint(map, caseTemperature_C), [map, caseTemperature_C]);
  const summary = useMemo(() => mapSummary(map, point.cell), [map, point.cell]);

  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver(([e]) => setWidth(Math.floor(e?.contentRect.width ?? 0)));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  useEffect(() => {
    const el = canvas.current;
    const ctx = el?.getContext('2d');
    if (!el || !ctx || width <= 0) return;
    const dpr = window.devicePixelRatio || 1;
    el.width = Math.round(width * dpr);
    el.height = Math.round(height * dpr);
    ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
    drawHeatMap(ctx, { map, width, height, units, palette: palette(scheme === 'dark'), contours, point, cursor });
  }, [map, width, height, units, scheme, contours, point, cursor]);

  const pointAt = (e: React.MouseEvent<HTMLCanvasElement>) => {
    const rect = e.currentTarget.getBoundingClientRect();
    const cell = cellAt(map, width, height, e.clientX - rect.left, e.clientY - rect.top);
    if (cell && (cell.r !== cursor?.r || cell.c !== cursor?.c)) onCursor(cell);
  };

  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    const from = cursor ?? point.cell;
    const move = MOVES[e.key];
    const big = e.shiftKey ? 5 : 1;
    const next = move ? { r: from.r + move.r * big, c: from.c + move.c * big } : e.key === 'Home' ? { r: from.r, c: 0 } : e.key === 'End' ? { r: from.r, c: Infinity } : null;
    if (!next) return;
    e.preventDefault();
    onCursor(clampCell(map, { r: next.r, c: Math.min(next.c, summary.cols - 1) }));
  };

  return (
    <figure className="heatmap" data-map={map.oil} data-rows={summary.rows} data-cols={summary.cols} data-summary={JSON.stringify(summary)} data-contours={JSON.stringify({ sb: contours.sb.length, lambda: contours.lambda.length, micropitting: contours.micropitting.length })}>
      <figcaption>{label}</figcaption>
      <div
        ref={box}
        className="heatmap__plot"
        tabIndex={0}
        role="application"
        aria-roledescription="operating map"
        aria-label={`Operating map of ${map.oil} for ${map.loadCase}: oil temperature up, load across. Arrow keys move the cell cursor; Shift moves five cells.`}
        aria-describedby={readoutId}
        onKeyDown={onKey}
        onFocus={() => (cursor ? undefined : onCursor(point.cell))}
      >
        <canvas ref={canvas} style={{ width: `${width}px`, height: `${height}px` }} aria-hidden="true" onMouseMove={pointAt} data-width={width} data-height={height} />
      </div>
    </figure>
  );
}

/** Redrawn only when its map, cursor or units change. */
export const HeatMap = memo(HeatMapView);
