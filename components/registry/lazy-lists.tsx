// The registry list routes render their screens from here. Anything two routes import lands in the chunk
// every page loads (`__common`), so the list screens and the table library they share sit behind this one
// `import()` and come in their own chunk. It is asked for as soon as a list route's file is evaluated (on
// opening one, or when the app fetches every route while idle), before the screen renders.
import { lazy, Suspense, type ComponentType } from 'react';
import { LoadingState } from '../ui/states';

type Lists = typeof import('./list-screens');

let loading: Promise<Lists> | null = null;
const load = (): Promise<Lists> => (loading ??= import('./list-screens'));

/** A route's default export: the named list screen, its chunk asked for now. */
export function lazyList(name: keyof Lists): ComponentType {
  void load().catch(() => {
    // Retried on render, where a failure reaches the route's error boundary.
    loading = null;
  });
  const Screen = lazy(() => load().then((m) => ({ default: m[name] })));
  return function LazyList() {
    return (
      <Suspense fallback={<LoadingState label="Opening the list…" />}>
        <Screen />
      </Suspense>
    );
  };
}
