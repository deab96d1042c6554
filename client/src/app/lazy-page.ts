import { lazy, type LazyExoticComponent, type ReactNode } from 'react';

type Page<TProps> = (props: TProps) => ReactNode;

/**
 * React.lazy for a page module's named export: each page becomes its own chunk, so the first
 * screen downloads only what it shows.
 */
export function lazyPage<TProps extends object, TKey extends string>(
  load: () => Promise<Record<TKey, Page<TProps>>>,
  name: TKey,
): LazyExoticComponent<Page<TProps>> {
  return lazy(async () => ({ default: (await load())[name] }));
}
