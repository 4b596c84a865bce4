import { render, screen } from '@testing-library/react';
import { Text } from 'react-native';
import { LinkCard } from '../../../components/ui/link-card';
import { theme } from '../../../constants/theme';

describe('LinkCard', () => {
  it('is one link named by its words, to where it is sent', () => {
    render(
      <LinkCard href="/runs/7" testID="run-7">
        <Text>nightly</Text>
      </LinkCard>,
    );
    const card = screen.getByRole('link', { name: 'nightly' });
    expect(card.getAttribute('href')).toBe('/runs/7');
    expect(card.getAttribute('data-testid')).toBe('run-7');
    expect(card.textContent).toBe('nightly');
  });

  it('is a panel box at least one touch target tall, with the caller’s additions', () => {
    render(
      <LinkCard href="/suites/asin" style={{ flexBasis: 320 }}>
        <Text>asin</Text>
      </LinkCard>,
    );
    const style = getComputedStyle(screen.getByRole('link', { name: 'asin' }));
    expect(style.minHeight).toBe(`${theme.touch}px`);
    expect(style.paddingTop).toBe(`${theme.space(4)}px`);
    expect(style.borderTopWidth).toBe('1px');
    expect(style.flexBasis).toBe('320px');
  });
});
