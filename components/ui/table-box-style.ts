import { theme } from '../../constants/theme';

/** The frame of a wide-screen table: ruled and rounded on the panel colour, clipping its rows to the corners. */
export const TABLE_BOX_STYLE = {
  backgroundColor: theme.color.panel,
  borderWidth: 1,
  borderColor: theme.color.rule,
  borderRadius: theme.radius,
  overflow: 'hidden',
} as const;
