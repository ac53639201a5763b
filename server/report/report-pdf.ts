import PDFDocument from 'pdfkit';
import type { PhotoView } from '@shared/api/diagnosis-types';
import { REPORT_TITLE, SAFETY_NOTE, type ReportLine, type ReportModel } from '@shared/report/report-model';
import { drawSpecBar, drawVerdictMark, SPEC_BAR_HEIGHT } from './pdf-marks';
import { PDF_COLOURS as C, PDF_FONT_FILES, PDF_FONTS as F, pdfText } from './pdf-style';

type Doc = InstanceType<typeof PDFDocument>;

export interface ReportPdfInput {
  shopName: string;
  report: ReportModel;
  /** Bytes of the photos that can be embedded (JPEG and PNG), by photo id. */
  photoBytes: ReadonlyMap<string, Buffer>;
  /** How dates are written on paper. */
  formatDate: (iso: string) => string;
}

const MARGIN = 48;
const FOOTER = 40;
const RESULT_COLUMN = 150;
const INDENT = 26;
const THUMB = { width: 120, height: 90 };

/** The customer's report as an A4 PDF: what was found first, then each check on the path, photos, who and when. */
export function renderReportPdf(input: ReportPdfInput): Promise<Buffer> {
  const { report, shopName } = input;
  const doc = new PDFDocument({
    size: 'A4',
    margins: { top: MARGIN, bottom: MARGIN + FOOTER, left: MARGIN, right: MARGIN },
    bufferPages: true,
    lang: 'en',
    displayTitle: true,
    info: { Title: `${REPORT_TITLE}: ${report.machine.title}`, Author: shopName, Subject: report.complaint, Creator: 'Probepath' },
  });
  for (const [name, file] of Object.entries(PDF_FONT_FILES)) doc.registerFont(name, file);
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const page = new Layout(doc, input);
  page.header();
  page.machineAndCustomer();
  page.outcome();
  page.checks();
  page.photos();
  page.whoAndWhen();
  page.footers();
  doc.end();
  return done;
}

class Layout {
  private readonly width: number;

  constructor(
    private readonly doc: Doc,
    private readonly input: ReportPdfInput,
  ) {
    this.width = doc.page.width - 2 * MARGIN;
  }

  private get r() {
    return this.input.report;
  }

  private get bottom() {
    return this.doc.page.height - this.doc.page.margins.bottom;
  }

  /** Starts a new page unless `height` still fits on this one. */
  private room(height: number) {
    if (this.doc.y + height > this.bottom) this.doc.addPage();
  }

  private text(font: string, size: number, colour: string, s: string, options: PDFKit.Mixins.TextOptions = {}, x?: number, y?: number) {
    this.doc.font(font).fontSize(size).fillColor(colour);
    const t = font === F.mono || font === F.monoBold ? s : pdfText(s);
    if (x === undefined) this.doc.text(t, options);
    else this.doc.text(t, x, y, options);
  }

  private heading(title: string) {
    this.room(60);
    this.doc.moveDown(0.9);
    this.text(F.bold, 13, C.primary, title);
    const y = this.doc.y + 2;
    this.doc.moveTo(MARGIN, y).lineTo(MARGIN + this.width, y).lineWidth(0.75).stroke(C.rule);
    this.doc.y = y + 8;
  }

  private field(label: string, value: string, x: number, width: number) {
    if (!value) return;
    this.text(F.semiBold, 8.5, C.muted, label.toUpperCase(), { width, characterSpacing: 0.4 }, x, this.doc.y);
    this.text(F.text, 11, C.text, value, { width }, x, this.doc.y);
    this.doc.moveDown(0.35);
  }

  header() {
    const { doc, r } = this;
    this.text(F.bold, 20, C.text, this.input.shopName, { width: this.width - 170 }, MARGIN, MARGIN);
    this.text(F.text, 12, C.muted, REPORT_TITLE, { width: this.width - 170 });
    const bottomLeft = doc.y;
    const when = this.input.formatDate(r.endedAt ?? r.startedAt);
    this.text(F.semiBold, 10, C.text, when, { width: 170, align: 'right' }, MARGIN + this.width - 170, MARGIN + 4);
    if (r.reference) this.text(F.text, 10, C.muted, `Job ${r.reference}`, { width: 170, align: 'right' });
    if (r.status !== 'concluded') this.text(F.bold, 10, C.warning, r.status === 'open' ? 'In progress: no finding yet' : 'Stopped without a finding', { width: 170, align: 'right' });
    doc.y = Math.max(bottomLeft, doc.y) + 8;
    doc.rect(MARGIN, doc.y, this.width, 3).fill(C.primary);
    doc.y += 14;
  }

  machineAndCustomer() {
    const { doc, r } = this;
    const half = (this.width - 24) / 2;
    const top = doc.y;
    this.text(F.bold, 14, C.text, r.machine.title, { width: half }, MARGIN, top);
    doc.moveDown(0.3);
    this.field('Engine', r.machine.engine, MARGIN, half);
    this.field('VIN', r.machine.vin, MARGIN, half);
    this.field('Mileage', r.machine.mileage ?? '', MARGIN, half);
    const leftBottom = doc.y;
    const right = MARGIN + half + 24;
    doc.y = top;
    this.field('Customer', r.customer.name, right, half);
    this.field('Contact', [r.customer.contact, r.customer.email].filter(Boolean).join(' · '), right, half);
    this.field('Procedure', r.procedure, right, half);
    doc.y = Math.max(leftBottom, doc.y) + 4;
    this.text(F.semiBold, 8.5, C.muted, 'THE COMPLAINT, IN THE CUSTOMER’S WORDS', { width: this.width, characterSpacing: 0.4 }, MARGIN, doc.y);
    this.text(F.text, 12, C.text, `“${r.complaint}”`, { width: this.width });
  }

  outcome() {
    const { doc, r } = this;
    if (!r.finding) {
      if (r.abandonReason) {
        this.heading('Stopped without a finding');
        this.text(F.text, 11, C.text, r.abandonReason, { width: this.width }, MARGIN, doc.y);
      }
      return;
    }
    this.heading('What we found');
    const pad = 12;
    const inner = this.width - 2 * pad;
    doc.font(F.bold).fontSize(15);
    const titleHeight = doc.heightOfString(pdfText(r.finding.title), { width: inner });
    doc.font(F.text).fontSize(11);
    const actionHeight = doc.heightOfString(pdfText(`Recommended action: ${r.finding.action}`), { width: inner });
    const boxHeight = pad * 2 + titleHeight + actionHeight + 22;
    this.room(boxHeight);
    const top = doc.y;
    doc.rect(MARGIN, top, this.width, boxHeight).fill(C.primarySoft);
    doc.rect(MARGIN, top, 4, boxHeight).fill(C.primary);
    this.text(F.bold, 15, C.text, r.finding.title, { width: inner }, MARGIN + pad, top + pad);
    this.text(F.semiBold, 11, C.muted, `Part: ${r.finding.part}`, { width: inner });
    doc.moveDown(0.25);
    this.text(F.text, 11, C.text, `Recommended action: ${r.finding.action}`, { width: inner });
    doc.y = top + boxHeight + 10;
    if (r.closingNote) this.paragraph('What was done', r.closingNote);
    if (r.parts) this.paragraph('Parts', r.parts);
    if (r.labour) this.paragraph('Labour', r.labour);
  }

  private paragraph(label: string, body: string) {
    this.room(40);
    this.text(F.semiBold, 8.5, C.muted, label.toUpperCase(), { width: this.width, characterSpacing: 0.4 }, MARGIN, this.doc.y);
    this.text(F.text, 11, C.text, body, { width: this.width });
    this.doc.moveDown(0.5);
  }

  checks() {
    const { r } = this;
    this.heading(`What we checked (${r.lines.length})`);
    if (r.retakenCount > 0) {
      const n = r.retakenCount;
      this.text(F.text, 9.5, C.muted, `${n} reading${n > 1 ? 's were' : ' was'} taken again; only the reading that counted is listed.`, { width: this.width }, MARGIN, this.doc.y);
      this.doc.moveDown(0.5);
    }
    for (const line of r.lines) this.check(line);
  }

  private check(line: ReportLine) {
    const { doc } = this;
    const left = MARGIN + INDENT;
    const mainWidth = this.width - INDENT - RESULT_COLUMN - 12;
    const resultX = MARGIN + this.width - RESULT_COLUMN;
    const embeddable = line.photos.filter((p) => this.input.photoBytes.has(p.id));

    doc.font(F.semiBold).fontSize(11.5);
    let height = doc.heightOfString(pdfText(line.title), { width: mainWidth }) + 8;
    doc.font(F.text).fontSize(9.5);
    if (line.spec) height += doc.heightOfString(pdfText(`Spec: ${line.spec}`), { width: mainWidth }) + 2;
    if (line.measure) height += SPEC_BAR_HEIGHT + 8;
    if (line.explanation) height += doc.heightOfString(pdfText(line.explanation), { width: mainWidth }) + 2;
    if (line.note) height += doc.heightOfString(pdfText(`Note: ${line.note}`), { width: mainWidth }) + 2;
    if (embeddable.length) height += THUMB.height + 8;
    this.room(Math.max(height, 44) + 10);

    const top = doc.y;
    doc.circle(MARGIN + 9, top + 8, 9).fill(C.track);
    this.text(F.semiBold, 9, C.text, String(line.number), { width: 18, align: 'center', lineBreak: false }, MARGIN, top + 3.5);
    this.text(F.semiBold, 11.5, C.text, line.title, { width: mainWidth }, left, top);
    doc.moveDown(0.2);
    if (line.spec) this.text(F.text, 9.5, C.text, `Spec: ${line.spec}`, { width: mainWidth }, left, doc.y);
    if (line.measure) {
      const barTop = doc.y + 8;
      drawSpecBar(doc, left, barTop, Math.min(mainWidth, 260), line.measure);
      doc.y = barTop + SPEC_BAR_HEIGHT;
    }
    if (line.explanation) this.text(F.text, 9, C.muted, line.explanation, { width: mainWidth }, left, doc.y);
    if (line.note) this.text(F.text, 9.5, C.text, `Note: ${line.note}`, { width: mainWidth }, left, doc.y + 2);
    let bottom = doc.y;

    this.text(line.kind === 'measure' ? F.monoBold : F.semiBold, line.kind === 'measure' ? 14 : 11, C.text, line.result, { width: RESULT_COLUMN, align: 'right' }, resultX, top);
    if (line.verdict && line.verdictWords) {
      doc.font(F.semiBold).fontSize(10.5);
      const words = pdfText(line.verdictWords);
      const wordsWidth = doc.widthOfString(words);
      const y = doc.y + 3;
      drawVerdictMark(doc, line.verdict, resultX + RESULT_COLUMN - wordsWidth - 16, y + 1);
      this.text(F.semiBold, 10.5, C.text, line.verdictWords, { width: RESULT_COLUMN, align: 'right' }, resultX, y);
    }
    bottom = Math.max(bottom, doc.y);

    if (embeddable.length) {
      doc.y = bottom + 6;
      this.thumbnails(embeddable, left, mainWidth + RESULT_COLUMN + 12);
      bottom = doc.y;
    }
    doc.moveTo(left, bottom + 6).lineTo(MARGIN + this.width, bottom + 6).lineWidth(0.5).stroke(C.rule);
    doc.x = MARGIN;
    doc.y = bottom + 12;
  }

  /** Thumbnails in rows, as many to a row as fit the width; a row that does not fit goes to the next page. */
  private thumbnails(photos: PhotoView[], x: number, width: number) {
    const perRow = Math.max(1, Math.floor((width + 10) / (THUMB.width + 10)));
    for (let i = 0; i < photos.length; i += perRow) {
      if (i > 0) this.room(THUMB.height + 10);
      photos.slice(i, i + perRow).forEach((p, j) => this.image(p, x + j * (THUMB.width + 10), this.doc.y, THUMB.width, THUMB.height));
      this.doc.y += THUMB.height + 8;
    }
  }

  private image(photo: PhotoView, x: number, y: number, w: number, h: number) {
    try {
      this.doc.image(this.input.photoBytes.get(photo.id)!, x, y, { fit: [w, h], align: 'center', valign: 'center' });
    } catch {
      // A file that sniffed as JPEG or PNG but cannot be decoded: leave a marked gap rather than fail the report.
      this.doc.rect(x, y, w, h).lineWidth(0.5).stroke(C.border);
      this.text(F.text, 8, C.muted, 'Photo could not be shown', { width: w, align: 'center' }, x, y + h / 2 - 5);
    }
  }

  photos() {
    const { doc, r } = this;
    const embeddable = r.photos.filter((p) => this.input.photoBytes.has(p.id));
    const all = [...r.photos, ...r.lines.flatMap((l) => l.photos)];
    const left = all.filter((p) => !this.input.photoBytes.has(p.id)).length;
    if (!embeddable.length && !left) return;
    this.heading('Photos');
    const w = (this.width - 20) / 3;
    const h = w * 0.75;
    for (let i = 0; i < embeddable.length; i += 3) {
      this.room(h + 10);
      embeddable.slice(i, i + 3).forEach((p, j) => this.image(p, MARGIN + j * (w + 10), doc.y, w, h));
      doc.y += h + 10;
    }
    if (left > 0) {
      this.text(F.text, 9.5, C.muted, `${left} more photo${left > 1 ? 's' : ''} can be seen at the shop (WebP pictures, or more than a report holds).`, { width: this.width }, MARGIN, doc.y);
    }
  }

  whoAndWhen() {
    const { doc, r } = this;
    this.heading('Who and when');
    const half = (this.width - 24) / 2;
    const top = doc.y;
    this.field(r.technicians.length > 1 ? 'Technicians' : 'Technician', r.technicians.join(', '), MARGIN, half);
    this.field('Started', this.input.formatDate(r.startedAt), MARGIN, half);
    const leftBottom = doc.y;
    doc.y = top;
    const right = MARGIN + half + 24;
    if (r.endedAt) this.field(r.status === 'concluded' ? 'Concluded' : 'Stopped', this.input.formatDate(r.endedAt), right, half);
    this.field('Time spent', r.timeSpent ?? '', right, half);
    doc.y = Math.max(leftBottom, doc.y) + 10;
    doc.font(F.text).fontSize(9);
    this.room(doc.heightOfString(pdfText(SAFETY_NOTE), { width: this.width }));
    this.text(F.text, 9, C.muted, SAFETY_NOTE, { width: this.width }, MARGIN, doc.y);
  }

  /** "Shop · machine · Page n of m" on every page, drawn in the bottom margin once the page count is known. */
  footers() {
    const { doc, r } = this;
    const range = doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i++) {
      doc.switchToPage(i);
      const bottomMargin = doc.page.margins.bottom;
      doc.page.margins.bottom = 0;
      const y = doc.page.height - MARGIN;
      this.text(F.text, 8.5, C.muted, `${this.input.shopName} · ${r.machine.title}`, { width: this.width - 80, lineBreak: false }, MARGIN, y);
      this.text(F.text, 8.5, C.muted, `Page ${i - range.start + 1} of ${range.count}`, { width: 80, align: 'right', lineBreak: false }, MARGIN + this.width - 80, y);
      doc.page.margins.bottom = bottomMargin;
    }
  }
}
