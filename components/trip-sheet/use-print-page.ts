/** Print styles exist only on the web (use-print-page.web.ts). */
export function usePrintPage(): void {}

export function printPage(): void {}
