import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { MESSAGE_MAX, type FittingMessage } from '@/server/schemas';
import { errorMessage } from '../api-client';
import { formatDateTime } from '../format';
import { usePostMessageMutation, useReadMessagesMutation } from '../queries/fitting-course';
import { colors, radius, space } from '../theme';
import { AppText } from '../ui/app-text';
import { Button } from '../ui/button';
import { EmptyState } from '../ui/empty-state';
import { TextField } from '../ui/text-field';

type MessageThreadProps = { fittingId: string; messages: readonly FittingMessage[]; unread: number };

/**
 * The messages of a fitting, oldest first, and a box to write one. Plain text only: shown as
 * React text (escaped), never as HTML. Opening the thread marks it read.
 */
export function MessageThread({ fittingId, messages, unread }: MessageThreadProps) {
  const post = usePostMessageMutation(fittingId);
  const read = useReadMessagesMutation(fittingId);
  const [body, setBody] = useState('');
  const { mutate: markRead } = read;
  useEffect(() => {
    if (unread > 0) markRead();
  }, [unread, markRead]);
  return (
    <View style={styles.thread}>
      {messages.length === 0 ? <EmptyState title="No messages yet" message="Ask a question or leave a note: the other side gets an e-mail." /> : null}
      {messages.map((m) => (
        <View key={m.id} style={[styles.message, m.mine ? styles.mine : styles.theirs]}>
          <AppText variant="label" tone="muted">{`${m.authorName}${m.fromPlayer ? '' : ' (fitting shop)'} · ${formatDateTime(m.at)}`}</AppText>
          <AppText selectable>{m.body}</AppText>
        </View>
      ))}
      <TextField label="Your message" value={body} onChangeText={setBody} multiline numberOfLines={3} maxLength={MESSAGE_MAX} hint={`Plain text, up to ${MESSAGE_MAX} characters.`} />
      {post.error ? <AppText tone="danger">{errorMessage(post.error)}</AppText> : null}
      <Button title="Send" busy={post.isPending} disabled={body.trim() === ''} onPress={() => post.mutate(body, { onSuccess: () => setBody('') })} />
    </View>
  );
}

const styles = StyleSheet.create({
  thread: { gap: space.md },
  message: { gap: space.xs, padding: space.md, borderRadius: radius.md, borderWidth: 1, borderColor: colors.border, maxWidth: 640 },
  mine: { alignSelf: 'flex-end', backgroundColor: colors.accentSoft },
  theirs: { alignSelf: 'flex-start', backgroundColor: colors.surface },
});
