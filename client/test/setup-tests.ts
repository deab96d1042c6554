import '@testing-library/jest-dom/jest-globals';
import { afterEach } from '@jest/globals';

import { installMatchMedia, resetViewport } from './viewport.js';

installMatchMedia();

afterEach(() => {
  resetViewport();
  window.localStorage.clear();
});
