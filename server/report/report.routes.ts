import type { EmailReportInput } from '@shared/report/schemas';
import { emailReportSchema } from '@shared/report/schemas';
import { ApiError } from '../http/api-error';
import type { RouteDef } from '../http/route';
import { answerOnceAfter } from '../idempotency/with-idempotency';
import { reportMail } from './report-mail';
import { loadReport, reportPdf } from './report-document';

/** Leaves room under the local mail fake's 25 MB message limit once base64 adds a third. */
const MAX_MAILED_PDF_BYTES = 15 * 1024 * 1024;

export const reportRoutes: RouteDef[] = [
  {
    method: 'get',
    path: '/api/diagnoses/:id/report.pdf',
    summary: "The customer's report of a diagnosis as a PDF: machine, complaint, each check with its reading, spec and verdict, the finding, photos, who and when.",
    roles: ['owner', 'lead', 'tech', 'apprentice'],
    async handler(req, res, ctx) {
      const doc = await reportPdf(ctx, req.member.shop.name, await loadReport(ctx.ds.manager, req));
      res.set({
        'Content-Type': 'application/pdf',
        'Content-Disposition': `inline; filename="${doc.filename}"`,
        'Cache-Control': 'private, no-cache',
      });
      res.send(doc.pdf);
    },
  },
  {
    method: 'post',
    path: '/api/diagnoses/:id/report/email',
    summary: "E-mail the report of a concluded diagnosis with its PDF attached, to `to` or else the job's customer e-mail. Honours Idempotency-Key.",
    roles: ['owner', 'lead', 'tech'],
    limited: true,
    body: emailReportSchema,
    async handler(req, res, ctx) {
      const input = req.body as EmailReportInput;
      await answerOnceAfter(ctx, req, res, async () => {
        const loaded = await loadReport(ctx.ds.manager, req);
        const { report } = loaded;
        if (report.status !== 'concluded') {
          throw new ApiError(409, 'not_concluded', 'Conclude the diagnosis at a finding before e-mailing its report.');
        }
        const to = input.to || report.customer.email;
        if (!to) {
          throw new ApiError(400, 'no_customer_email', 'This job has no customer e-mail. Type the address to send the report to.', { to: 'Enter the address to send the report to.' });
        }
        const doc = await reportPdf(ctx, req.member.shop.name, loaded);
        if (doc.pdf.length > MAX_MAILED_PDF_BYTES) {
          throw new ApiError(413, 'report_too_large', 'The report with its photos is too large to e-mail. Download the PDF and hand it over instead.');
        }
        const mail = reportMail({ shopName: req.member.shop.name, report, sentBy: req.member.name });
        try {
          await ctx.mailer.send({ shopId: req.member.shopId, to, ...mail, attachments: [{ filename: doc.filename, content: doc.pdf, contentType: 'application/pdf' }] });
        } catch (err) {
          req.log.warn({ err }, 'report mail not sent');
          throw new ApiError(502, 'mail_failed', 'The mail server did not take the report. Nothing was sent; try again in a few minutes.');
        }
        return { status: 200, body: { sent: { to, subject: mail.subject, filename: doc.filename, sentAt: new Date().toISOString() } } };
      });
    },
  },
];
