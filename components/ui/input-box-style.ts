import { theme } from '../../constants/theme';

/** The look of every text box in the app: one touch target tall, ruled, on the panel colour. */
export const INPUT_BOX_STYLE = {
  minHeight: theme.touch,
  borderWidth: 1,
  borderColor: theme.color.rule,
  borderRadius: theme.radius,
  paddingHorizontal: theme.space(3),
  fontFamily: theme.font.regular,
  fontSize: theme.size.body,
  color: theme.color.ink,
  backgroundColor: theme.color.panel,
} as const;
