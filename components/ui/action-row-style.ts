import { theme } from '../../constants/theme';

/**
 * A list row of words with an action beside them (a token, an added target): ruled above, the
 * action wrapping under the words on a phone instead of squeezing them.
 */
export const ACTION_ROW_STYLE = {
  flexDirection: 'row',
  flexWrap: 'wrap',
  alignItems: 'flex-start',
  justifyContent: 'space-between',
  gap: theme.space(3),
  borderTopWidth: 1,
  borderTopColor: theme.color.rule,
  paddingVertical: theme.space(3),
} as const;
