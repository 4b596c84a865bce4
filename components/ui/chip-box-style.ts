import { theme } from '../../constants/theme';

/** The box of a choice chip or a small link button: 44 px tall, ruled and rounded, its words centred. */
export const CHIP_BOX_STYLE = {
  minHeight: 44,
  justifyContent: 'center',
  paddingHorizontal: theme.space(3),
  borderRadius: theme.radius,
  borderWidth: 1,
  borderColor: theme.color.control,
} as const;
