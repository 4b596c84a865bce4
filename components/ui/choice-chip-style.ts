import { theme } from '../../constants/theme';
import { CHIP_BOX_STYLE } from './chip-box-style';

/** The box of a choice chip (radio or check box): the chip box with its drawn mark before the words. */
export const CHOICE_CHIP_STYLE = {
  ...CHIP_BOX_STYLE,
  flexDirection: 'row',
  alignItems: 'center',
  gap: theme.space(2),
  backgroundColor: theme.color.panel,
} as const;
