/**
 * On the web each weight also names its metric-matched local fallback, which the page draws with until Nunito
 * arrives (scripts/web-fonts.ts writes both faces into index.html).
 */
export const face = (family: string): string => `${family}, "${family} Fallback"`;
