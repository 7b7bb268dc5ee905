import '@testing-library/jest-dom/vitest';
import { notifications } from '@mantine/notifications';
import { cleanup, configure } from '@testing-library/react';
import { afterEach, vi } from 'vitest';
import { clearAccessToken } from '../lib/auth-token';

// Screens are lazily loaded chunks; their first import in a busy worker can take over a second.
configure({ asyncUtilTimeout: 5000 });

// jsdom lacks these browser APIs that Mantine and mantine-datatable use.

// mantine-datatable renders no columns unless an empty media query matches.
Object.defineProperty(window, 'matchMedia', {
  writable: true,
  configurable: true,
  value: (query: string): MediaQueryList => ({
    matches: query.trim() === '',
    media: query,
    onchange: null,
    addListener: () => undefined,
    removeListener: () => undefined,
    addEventListener: () => undefined,
    removeEventListener: () => undefined,
    dispatchEvent: () => false,
  }),
});

class ResizeObserverStub {
  observe(): void {}
  unobserve(): void {}
  disconnect(): void {}
}
window.ResizeObserver = ResizeObserverStub;

Element.prototype.scrollIntoView = function scrollIntoView() {};

// Mantine's autosizing Textarea listens for web fonts loading; jsdom has no document.fonts.
if (!('fonts' in document)) {
  Object.defineProperty(document, 'fonts', {
    configurable: true,
    value: { addEventListener: () => undefined, removeEventListener: () => undefined, ready: Promise.resolve() },
  });
}

// Downloads hand a blob URL to a link; jsdom has no blob URLs.
URL.createObjectURL = () => 'blob:potlife-test';
URL.revokeObjectURL = () => undefined;

afterEach(() => {
  cleanup();
  notifications.clean();
  clearAccessToken();
  window.localStorage.clear();
  window.sessionStorage.clear();
  vi.unstubAllGlobals();
});
