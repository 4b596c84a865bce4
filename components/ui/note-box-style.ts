import { theme } from '../../constants/theme';

/** The look of a note that explains what a table or run does and does not say: a focus-coloured bar on its left, on the panel colour. */
export const NOTE_BOX_STYLE = {
  borderLeftWidth: 3,
  borderLeftColor: theme.color.focus,
  backgroundColor: theme.color.panel,
  borderRadius: theme.radius,
  padding: theme.space(4),
} as const;
