import { useEffect } from 'react';

/**
 * Paper gets the report alone: no sections, no buttons, no card frame, and the
 * scrolling page laid out at full length so every check prints.
 */
const CSS = `
@media print {
  @page { margin: 14mm; }
  html, body, #root { height: auto !important; overflow: visible !important; background: #fff !important; }
  [role="navigation"], div:has(> [data-testid="shell-shop-name"]), [data-testid="report-actions"], [data-testid="report-add-photo"] { display: none !important; }
  [data-testid="report-screen"], [data-testid="report-screen"] * { overflow: visible !important; }
  [data-testid="report-screen"] { position: static !important; height: auto !important; }
  [data-testid="report-screen"], [data-testid="report-screen"] > div { background: #fff !important; padding: 0 !important; }
  [data-testid="report-screen"] [role="heading"][aria-level="1"] { display: none !important; }
  [data-testid="report-paper"] { border: none !important; box-shadow: none !important; padding: 0 !important; }
  [data-testid="report-paper"] [role="listitem"], [data-testid="report-paper"] [role="group"] { break-inside: avoid; }
  [data-testid="report-paper"] div:has(> [role="heading"]) { break-after: avoid; break-inside: avoid; }
  body * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}`;

export function PrintStyle() {
  useEffect(() => {
    const style = document.createElement('style');
    style.dataset.report = 'print';
    style.textContent = CSS;
    document.head.append(style);
    return () => style.remove();
  }, []);
  return null;
}
