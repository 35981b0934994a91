/**
 * Moves keyboard focus to the element rendered with this nativeID. Used where a component cannot hand out a
 * ref (Button keeps its Pressable to itself); on native there is no document and this does nothing.
 */
export function focusNativeId(id: string): void {
  if (typeof document === 'undefined') return;
  setTimeout(() => document.getElementById(id)?.focus(), 0);
}
