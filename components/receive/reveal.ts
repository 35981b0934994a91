/**
 * Scrolls the element rendered with this nativeID into view and moves focus to it (a new verdict replaces the
 * form, and a person on a phone must not be left looking at the middle of it). On native this does nothing.
 */
export function revealNativeId(id: string): void {
  if (typeof document === 'undefined') return;
  setTimeout(() => {
    const el = document.getElementById(id);
    if (!el) return;
    el.scrollIntoView({ block: 'start' });
    if (!el.hasAttribute('tabindex')) el.setAttribute('tabindex', '-1');
    el.focus({ preventScroll: true });
  }, 0);
}
