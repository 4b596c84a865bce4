import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { theme } from '../../constants/theme';
import type { ReceivedMailView } from '../../shared/received-mail-view';
import { RadioMark } from '../ui/radio-mark';
import { SkText } from '../ui/sk-text';
import { MailHtmlFrame } from './mail-html-frame';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

type Part = 'html' | 'text';

/** One received message: its envelope, and its HTML part rendered in a sandbox or its plain-text part. */
export function MailView({ message }: { message: ReceivedMailView }) {
  const hasHtml = Boolean(message.html);
  const [part, setPart] = useState<Part>(hasHtml ? 'html' : 'text');
  const parts: { key: Part; label: string }[] = [
    { key: 'html', label: 'Rendered HTML' },
    { key: 'text', label: 'Plain text' },
  ];
  return (
    <View style={styles.view} testID="mail-view">
      <View style={styles.envelope}>
        <SkText variant="heading" style={styles.subject}>
          {message.subject || '(no subject)'}
        </SkText>
        <SkText variant="mono">
          <Text style={styles.key}>From </Text>
          {message.from}
        </SkText>
        <SkText variant="mono">
          <Text style={styles.key}>To </Text>
          {message.to.join(', ')}
        </SkText>
        <SkText variant="mono">
          <Text style={styles.key}>Received </Text>
          {formatDate(message.receivedAt)}
        </SkText>
      </View>
      <View style={styles.tabs} accessibilityRole="tablist" aria-label="Part of the message">
        {parts.map((p) => {
          const disabled = p.key === 'html' && !hasHtml;
          return (
            <Pressable
              key={p.key}
              accessibilityRole="tab"
              accessibilityLabel={p.label}
              aria-selected={part === p.key}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => setPart(p.key)}
              style={[styles.tab, part === p.key && styles.tabOn, disabled && styles.tabDisabled]}
            >
              <RadioMark on={part === p.key} inverse={part === p.key} />
              <SkText variant="label" style={part === p.key && styles.tabTextOn}>
                {p.label}
                {disabled ? ' (none)' : ''}
              </SkText>
            </Pressable>
          );
        })}
      </View>
      {part === 'html' && message.html ? (
        <>
          <SkText variant="caption">
            Shown in a sandbox: scripts, forms and links in the message do nothing here, and remote images are not
            loaded.
          </SkText>
          <MailHtmlFrame html={message.html} title={`HTML part of “${message.subject}”`} />
        </>
      ) : (
        <SkText variant="mono" selectable style={styles.text} testID="mail-text">
          {message.text || '(the plain-text part is empty)'}
        </SkText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: theme.space(3) },
  envelope: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(1),
  },
  subject: { marginBottom: theme.space(1) },
  key: { fontFamily: theme.font.medium, color: theme.color.inkFaint },
  tabs: { flexDirection: 'row', gap: theme.space(2), flexWrap: 'wrap' },
  tab: {
    minHeight: theme.touch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(2),
    paddingHorizontal: theme.space(4),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.control,
    backgroundColor: theme.color.panel,
  },
  tabOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  tabDisabled: { opacity: 0.6 },
  tabTextOn: { color: theme.color.accentInk },
  text: {
    lineHeight: 20,
    ...PANEL_BOX_STYLE,
    whiteSpace: 'pre-wrap',
  } as object,
});
