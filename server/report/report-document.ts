import fs from 'node:fs/promises';
import type { EntityManager } from 'typeorm';
import type { PhotoView } from '@shared/api/diagnosis-types';
import { buildReport, type ReportModel } from '@shared/report/report-model';
import type { AppContext } from '../app-context';
import { loadDiagnosis, photosOf, stepsOf } from '../diagnoses/diagnoses.routes';
import { toDetail } from '../diagnoses/diagnosis-views';
import type { AuthedRequest } from '../http/route';
import type { DiagnosisPhoto } from '../photos/photo.entity';
import { photoFile } from '../photos/photo-storage';
import { renderReportPdf } from './report-pdf';

/** pdfkit embeds JPEG and PNG; a report holds at most this many, to stay a size mail servers take. */
const EMBEDDABLE = new Set(['image/jpeg', 'image/png']);
const MAX_EMBEDDED_PHOTOS = 24;

const dateTime = new Intl.DateTimeFormat('en-GB', { dateStyle: 'medium', timeStyle: 'short' });

export interface LoadedReport {
  report: ReportModel;
  photos: DiagnosisPhoto[];
}

/** The report of a diagnosis the member may read (404 otherwise). */
export async function loadReport(m: EntityManager, req: AuthedRequest): Promise<LoadedReport> {
  const d = await loadDiagnosis(m, req);
  const photos = await photosOf(m, d.id);
  return { report: buildReport(toDetail(d, await stepsOf(m, d.id), photos)), photos };
}

/** The report as a PDF, with the file name it is offered under. */
export async function reportPdf(ctx: AppContext, shopName: string, { report, photos }: LoadedReport): Promise<{ pdf: Buffer; filename: string }> {
  const pdf = await renderReportPdf({
    shopName,
    report,
    photoBytes: await embeddablePhotos(ctx, report, photos),
    formatDate: (iso) => dateTime.format(new Date(iso)),
  });
  return { pdf, filename: reportFilename(report) };
}

/** Photos in the order the report shows them: each check's, then the diagnosis's own. */
async function embeddablePhotos(ctx: AppContext, report: ReportModel, stored: DiagnosisPhoto[]): Promise<Map<string, Buffer>> {
  const byId = new Map(stored.map((p) => [p.id, p]));
  const ordered: PhotoView[] = [...report.lines.flatMap((l) => l.photos), ...report.photos];
  const bytes = new Map<string, Buffer>();
  for (const view of ordered.filter((p) => EMBEDDABLE.has(p.contentType)).slice(0, MAX_EMBEDDED_PHOTOS)) {
    const p = byId.get(view.id)!;
    const content = await fs.readFile(photoFile(ctx.config.dataDir, p.shopId, p.storageKey)).catch(() => null);
    if (content) bytes.set(p.id, content);
  }
  return bytes;
}

/** "report-2019-veltro-t650-2025-03-12.pdf": plain ASCII, safe in a header. */
function reportFilename(report: ReportModel): string {
  const slug = report.machine.title
    .normalize('NFKD')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60);
  return `report-${slug || 'machine'}-${(report.endedAt ?? report.startedAt).slice(0, 10)}.pdf`;
}
