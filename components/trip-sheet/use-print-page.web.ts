import { useEffect } from 'react';

// Paper: A4 and US Letter both fit (the sheet is laid out narrower than Letter and shorter than A4's width allows);
// the app's scrolling containers let the sheet flow from page to page; colours print as drawn.
const PRINT_CSS = `
@page { margin: 12mm; }
@media print {
  html, body, #root { height: auto !important; min-height: 0 !important; overflow: visible !important; background: #fff !important; }
  #root *:not(svg) { overflow: visible !important; }
  #root [data-testid="trip-sheet-map"] { overflow: hidden !important; }
  [data-testid="trip-sheet-toolbar"] { display: none !important; }
  [role="row"], [data-testid="trip-sheet-head"], [data-testid^="trip-sheet-flag-"] { break-inside: avoid; }
  * { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
}`;

/** Adds the trip sheet's print rules to the page while the sheet is open. */
export function usePrintPage(): void {
  useEffect(() => {
    const style = document.createElement('style');
    style.setAttribute('data-trip-sheet', 'print');
    style.textContent = PRINT_CSS;
    document.head.appendChild(style);
    return () => style.remove();
  }, []);
}

export function printPage(): void {
  window.print();
}
