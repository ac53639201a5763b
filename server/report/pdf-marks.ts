import type PDFDocument from 'pdfkit';
import { specBarGeometry } from '@shared/diagnosis/spec-bar-geometry';
import type { Evaluation } from '@shared/engine/evaluate';
import type { MeasureCheck } from '@shared/engine/procedure';
import type { Quantity } from '@shared/engine/quantity';
import { formatValue } from '@shared/engine/units';
import type { Verdict } from '@shared/engine/verdict';
import { PDF_COLOURS as C, PDF_FONTS as F, pdfText } from './pdf-style';

type Doc = InstanceType<typeof PDFDocument>;

/** Height the spec bar takes, labels included. */
export const SPEC_BAR_HEIGHT = 30;
const TRACK = 10;
const OVER_ZONE = 22;

/**
 * The spec bar drawn for paper: the acceptance window, the marginal bands
 * either side of each limit, the limits named under the track, the reading as
 * a marker; over range (OL) sits in its own zone past the right end.
 */
export function drawSpecBar(doc: Doc, x: number, y: number, width: number, m: { check: MeasureCheck; quantity: Quantity; evaluation: Evaluation }) {
  const g = specBarGeometry(m.check.spec, m.quantity, m.evaluation);
  if (!g) return;
  const trackWidth = width - OVER_ZONE;
  const at = (f: number) => x + f * trackWidth;
  doc.save();
  doc.rect(x, y, trackWidth, TRACK).fill(C.track);
  doc.rect(at(1), y, OVER_ZONE, TRACK).fill(g.overRangePasses ? C.windowFill : C.overFill);
  if (g.window) doc.rect(at(g.window.from), y, at(g.window.to) - at(g.window.from), TRACK).fill(C.windowFill);
  for (const b of g.bands) doc.rect(at(b.from), y, Math.max(at(b.to) - at(b.from), 1), TRACK).fill(C.bandFill);
  doc.rect(x, y, width, TRACK).lineWidth(0.5).stroke(C.border);
  doc.font(F.text).fontSize(6.5).fillColor(C.muted);
  doc.text('OL', at(1), y + 2.2, { width: OVER_ZONE, align: 'center', lineBreak: false });
  for (const l of g.limits) {
    doc.moveTo(at(l.at), y - 2).lineTo(at(l.at), y + TRACK + 2).lineWidth(1).stroke(C.window);
    const label = pdfText(m.check.spec.kind === 'ratio' ? `${Number(l.value.toPrecision(3))}×` : formatValue(l.value, m.quantity));
    const w = doc.widthOfString(label) + 2;
    const left = Math.min(Math.max(at(l.at) - w / 2, x), x + trackWidth - w);
    doc.fillColor(C.muted).text(label, left, y + TRACK + 4, { width: w, align: 'center', lineBreak: false });
  }
  const marker = g.marker;
  if (marker) {
    const mx = marker.kind === 'over_range' ? at(1) + OVER_ZONE / 2 : at(marker.at);
    doc.moveTo(mx, y - 1).lineTo(mx, y + TRACK + 1).lineWidth(2).stroke(C.text);
    doc.polygon([mx - 4, y - 6], [mx + 4, y - 6], [mx, y - 1]).fill(C.text);
  }
  doc.restore();
}

/**
 * Each verdict has its own shape beside its word, so the report never relies on colour: the same drawings
 * as the app's verdict icons (src/components/verdict/verdict-mark.tsx), on their 24-unit grid.
 */
const VERDICT_PATHS: Record<Verdict, { fill?: string; stroke: string[] }> = {
  in_spec: { fill: 'M21.5 12a9.5 9.5 0 1 1-19 0a9.5 9.5 0 1 1 19 0z', stroke: ['M7.5 12.5l3 3 6-6.5'] },
  low: { fill: 'M3 6.5h18L12 20z', stroke: [] },
  high: { fill: 'M3 17.5h18L12 4z', stroke: [] },
  open: { stroke: ['M2 12h6M16 12h6M8 12l7-5.5'] },
  marginal: { fill: 'M12 2l10 10-10 10L2 12z', stroke: ['M7.5 12.5c1.5-2 3-2 4.5 0s3 2 4.5 0'] },
  no_reading: { stroke: ['M21.5 12a9.5 9.5 0 1 1-19 0a9.5 9.5 0 1 1 19 0z', 'M7.5 12h9'] },
};

export function drawVerdictMark(doc: Doc, verdict: Verdict, x: number, y: number, size = 11) {
  const colour = VERDICT_COLOUR[verdict];
  const shape = VERDICT_PATHS[verdict];
  doc.save().translate(x, y).scale(size / 24);
  if (shape.fill) doc.path(shape.fill).fill(colour);
  // Lines drawn over a filled shape are cut out of it in white.
  const ink = shape.fill ? '#FFFFFF' : colour;
  for (const d of shape.stroke) doc.path(d).lineWidth(2.4).lineCap('round').lineJoin('round').stroke(ink);
  doc.restore();
}

const VERDICT_COLOUR: Record<Verdict, string> = {
  in_spec: C.success,
  low: C.danger,
  high: C.danger,
  open: C.danger,
  marginal: C.warning,
  no_reading: C.muted,
};
