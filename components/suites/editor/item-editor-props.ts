import type { FieldRules } from './field-rules';

/** What an editor of one item of a list in the suite form takes: the item, its place, and the form's rules. */
export interface ItemEditorProps<T> {
  value: T;
  index: number;
  onChange: (next: T) => void;
  onRemove: () => void;
  rules: FieldRules;
}
