// Brings a form field into view and gives it the keyboard focus, for the first refusal after a save.
const FOCUSABLE = 'input, textarea, select, button, [tabindex]:not([tabindex="-1"])';

type Focusable = { focus?: () => void };

/**
 * On the web the field's wrapper is a DOM element: its first control takes the focus and the wrapper is centred in
 * its scrolling container (a plain focus() would leave it under the sticky header or at the very bottom edge).
 */
export function revealField(target: unknown): void {
  if (typeof HTMLElement !== 'undefined' && target instanceof HTMLElement) {
    const control = target.matches(FOCUSABLE) ? target : target.querySelector<HTMLElement>(FOCUSABLE);
    (control ?? target).focus({ preventScroll: true });
    target.scrollIntoView({ block: 'center' });
    return;
  }
  (target as Focusable | null)?.focus?.();
}
