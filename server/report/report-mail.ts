import type { ReportModel } from '@shared/report/report-model';

const escape = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

/** The message the report PDF travels with: plain text with a simple HTML twin. */
export function reportMail(p: { shopName: string; report: ReportModel; sentBy: string }) {
  const { report } = p;
  const paragraphs = [
    `Hello ${report.customer.name},`,
    `Attached is the report of the electrical diagnosis of your ${report.machine.title} at ${p.shopName}.`,
    ...(report.finding ? [`What we found: ${report.finding.title}. ${report.finding.action}`] : []),
    'The report lists every check we made, with the reading we took and the spec it was held against.',
    `${p.sentBy}, ${p.shopName}`,
  ];
  return {
    subject: `Diagnosis report: your ${report.machine.title}`,
    text: `${paragraphs.join('\n\n')}\n`,
    html: `<div style="font-family:sans-serif;font-size:16px;line-height:1.5;color:#14202B">${paragraphs.map((x) => `<p>${escape(x)}</p>`).join('')}</div>`,
  };
}
