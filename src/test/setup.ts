import { cleanup } from '@testing-library/react';
import { afterEach, vi } from 'vitest';

// jsdom has no scrolling; react-router's ScrollRestoration calls it.
window.scrollTo = () => {};

// Plain assertions (no jest-dom): each test unmounts, and stubbed globals (fetch) are restored.
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});
