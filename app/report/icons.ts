/**
 * Icon shapes that go with every verdict and state colour, so that nothing is told by colour
 * alone: AW suffices — circle with a tick; EP warranted — triangle with a bar; beyond oil
 * chemistry — octagon with a cross. States: Draft — open square; Signed — circle with a tick;
 * Changed since signing — triangle with "!".
 */
import type { ReviewStatus, VerdictCode } from '../review/results';
import { INK, OKABE_ITO, VERDICT_COLOURS } from './words';

type Doc = PDFKit.PDFDocument;

function tick(doc: Doc, cx: number, cy: number, r: number): void {
  doc
    .moveTo(cx - 0.5 * r, cy + 0.02 * r)
    .lineTo(cx - 0.12 * r, cy + 0.42 * r)
    .lineTo(cx + 0.55 * r, cy - 0.4 * r)
    .lineWidth(Math.max(0.8, r * 0.28))
    .lineCap('round')
    .lineJoin('round')
    .strokeColor('#ffffff')
    .stroke();
}

function polygon(doc: Doc, cx: number, cy: number, r: number, n: number, rotation: number): void {
  for (let i = 0; i < n; i++) {
    const a = rotation + (2 * Math.PI * i) / n;
    const x = cx + r * Math.cos(a);
    const y = cy + r * Math.sin(a);
    if (i === 0) doc.moveTo(x, y);
    else doc.lineTo(x, y);
  }
  doc.closePath();
}

/** Draw the verdict icon with its top-left corner at (x, y), `size` points wide. */
export function drawVerdictIcon(doc: Doc, code: VerdictCode, x: number, y: number, size: number): void {
  const r = size / 2;
  const cx = x + r;
  const cy = y + r;
  doc.save();
  const colour = VERDICT_COLOURS[code];
  if (code === 'aw-suffices') {
    doc.circle(cx, cy, r).fillColor(colour).fill();
    tick(doc, cx, cy, r);
  } else if (code === 'ep-warranted') {
    const h = r * 1.1;
    doc
      .moveTo(cx, cy - h)
      .lineTo(cx + r * 1.05, cy + r * 0.85)
      .lineTo(cx - r * 1.05, cy + r * 0.85)
      .closePath()
      .fillColor(colour)
      .fill();
    doc.rect(cx - r * 0.13, cy - r * 0.35, r * 0.26, r * 0.7).fillColor(INK).fill();
  } else {
    polygon(doc, cx, cy, r, 8, Math.PI / 8);
    doc.fillColor(colour).fill();
    const k = r * 0.42;
    doc
      .moveTo(cx - k, cy - k)
      .lineTo(cx + k, cy + k)
      .moveTo(cx + k, cy - k)
      .lineTo(cx - k, cy + k)
      .lineWidth(Math.max(0.8, r * 0.26))
      .lineCap('round')
      .strokeColor('#ffffff')
      .stroke();
  }
  doc.restore();
}

export const STATUS_COLOURS: Readonly<Record<ReviewStatus, string>> = {
  draft: '#555555',
  signed: OKABE_ITO.blue,
  'changed-since-signing': OKABE_ITO.vermillion,
};

/** Draw the state icon with its top-left corner at (x, y). */
export function drawStatusIcon(doc: Doc, status: ReviewStatus, x: number, y: number, size: number): void {
  const r = size / 2;
  const cx = x + r;
  const cy = y + r;
  const colour = STATUS_COLOURS[status];
  doc.save();
  if (status === 'draft') {
    doc.rect(x + 1, y + 1, size - 2, size - 2).lineWidth(1.5).strokeColor(colour).stroke();
    doc.moveTo(x + 0.28 * size, y + 0.62 * size).lineTo(x + 0.72 * size, y + 0.62 * size).lineWidth(1).stroke();
  } else if (status === 'signed') {
    doc.circle(cx, cy, r).fillColor(colour).fill();
    tick(doc, cx, cy, r);
  } else {
    doc
      .moveTo(cx, y)
      .lineTo(x + size, y + size)
      .lineTo(x, y + size)
      .closePath()
      .fillColor(colour)
      .fill();
    doc.rect(cx - r * 0.1, y + size * 0.32, r * 0.2, size * 0.38).fillColor('#ffffff').fill();
    doc.rect(cx - r * 0.1, y + size * 0.78, r * 0.2, size * 0.12).fillColor('#ffffff').fill();
  }
  doc.restore();
}
