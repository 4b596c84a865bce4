import { theme } from '../../constants/theme';
import { textVariants } from './text-variants';

/** The look of every text box in the app: one touch target tall, ruled, on the panel colour. */
export const INPUT_BOX_STYLE = {
  minHeight: theme.touch,
  borderWidth: 1,
  borderColor: theme.color.control,
  borderRadius: theme.radius,
  paddingHorizontal: theme.space(3),
  ...textVariants.body,
  backgroundColor: theme.color.panel,
} as const;
