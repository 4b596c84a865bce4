import { Children, isValidElement, useEffect, type ReactElement, type ReactNode } from 'react';

/**
 * Screen tests render screens outside a navigator, where expo-router's Head (which asks whether its
 * screen is focused) has no navigation to ask. This Head does what the real one does to the title
 * on the web: it writes its <title> into `document.title`, so a test can read the tab's title.
 */
function Head({ children }: { children: ReactNode }) {
  const title = Children.toArray(children).find(
    (child): child is ReactElement<{ children: ReactNode }> => isValidElement(child) && child.type === 'title',
  );
  const text = title ? Children.toArray(title.props.children).join('') : null;
  useEffect(() => {
    if (text !== null) document.title = text;
  }, [text]);
  return null;
}

Head.Provider = function Provider({ children }: { children: ReactNode }) {
  return children;
};

export default Head;
