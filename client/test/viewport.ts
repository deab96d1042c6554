// A stand-in for window.matchMedia (jsdom has none) that answers width and colour-scheme queries
// for a viewport the test chooses.
const viewport = { width: 1280, prefersDark: false };

function conditionHolds(condition: string): boolean {
  const match = /\(\s*([a-z-]+)\s*:\s*([^)]+?)\s*\)/.exec(condition);
  if (!match) return false;
  const [, feature, value = ''] = match;
  const px = Number.parseFloat(value);
  switch (feature) {
    case 'min-width':
      return viewport.width >= px;
    case 'max-width':
      return viewport.width <= px;
    case 'prefers-color-scheme':
      return (value === 'dark') === viewport.prefersDark;
    default:
      return false;
  }
}

function matches(query: string): boolean {
  const cleaned = query.replace(/^@media\s*/, '');
  return cleaned.split(/\s+and\s+/).every(conditionHolds);
}

export function installMatchMedia(): void {
  Object.defineProperty(window, 'matchMedia', {
    configurable: true,
    writable: true,
    value: (query: string): MediaQueryList =>
      ({
        media: query,
        matches: matches(query),
        onchange: null,
        addEventListener: () => undefined,
        removeEventListener: () => undefined,
        addListener: () => undefined,
        removeListener: () => undefined,
        dispatchEvent: () => false,
      }) as MediaQueryList,
  });
}

/** Width in CSS pixels: 390 is a common phone, 1440 a laptop. */
export function setViewport(options: { width: number; prefersDark?: boolean }): void {
  viewport.width = options.width;
  viewport.prefersDark = options.prefersDark ?? false;
}

export function resetViewport(): void {
  setViewport({ width: 1280 });
}
