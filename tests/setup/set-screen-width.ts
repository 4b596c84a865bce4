import { act } from '@testing-library/react';

/**
 * jsdom lays nothing out, so react-native-web's window width reads 0 (a phone). This sets the
 * width it reads and tells it the window changed, for tests of the wide layouts.
 */
export function setScreenWidth(width: number): void {
  Object.defineProperty(document.documentElement, 'clientWidth', { configurable: true, value: width });
  Object.defineProperty(window, 'innerWidth', { configurable: true, value: width });
  act(() => {
    window.dispatchEvent(new Event('resize'));
  });
}
