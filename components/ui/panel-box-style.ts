import { theme } from '../../constants/theme';

/** The look of every card and panel box in the app: ruled and rounded, on the panel colour, with the card padding. */
export const PANEL_BOX_STYLE = {
  backgroundColor: theme.color.panel,
  borderWidth: 1,
  borderColor: theme.color.rule,
  borderRadius: theme.radius,
  padding: theme.space(4),
} as const;
