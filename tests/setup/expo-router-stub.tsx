import { cloneElement, isValidElement, type ReactElement, type ReactNode } from 'react';

/**
 * Screen tests render components outside a navigator: this Link renders what expo-router's does
 * on the web, an element carrying `href` (react-native-web makes it an <a>), so tests can read
 * where a link goes. Use with `jest.mock('expo-router', () => require('../setup/expo-router-stub'))`.
 */
export function Link({ href, asChild, children }: { href: string; asChild?: boolean; children: ReactNode }) {
  if (asChild && isValidElement(children)) return cloneElement(children as ReactElement<{ href?: string }>, { href });
  return <a href={href}>{children}</a>;
}
