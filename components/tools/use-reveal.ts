import { useEffect, useRef } from 'react';
import { Platform, type View } from 'react-native';
import { useIsWide } from '../use-layout';

/**
 * On a phone the answer appears below the form, out of sight; bring it into view when a new one arrives.
 * (On a wide screen it sits beside the form already.)
 */
export function useRevealOnPhone(answer: unknown) {
  const ref = useRef<View>(null);
  const wide = useIsWide();
  useEffect(() => {
    if (!answer || wide || Platform.OS !== 'web') return;
    // On the web a View's ref is its DOM element.
    const node = ref.current as unknown as { scrollIntoView?: (opts: object) => void } | null;
    node?.scrollIntoView?.({ block: 'start' });
  }, [answer, wide]);
  return ref;
}
