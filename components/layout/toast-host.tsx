import { Pressable, StyleSheet, View } from 'react-native';
import { SIDE_NAV_WIDTH, useIsWide } from '@/components/theme/breakpoints';
import { colors, radii, shadow, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';
import { dismissToast, useToastStore } from '@/stores/toast-store';

/** Short confirmations ("Saved") and undo offers, announced politely to screen readers. */
export function ToastHost() {
  const toasts = useToastStore((s) => s.toasts);
  const wide = useIsWide();
  if (toasts.length === 0) return null;
  return (
    <View style={[styles.host, wide ? styles.hostWide : null]} pointerEvents="box-none" aria-live="polite">
      {toasts.map((t) => (
        <View
          key={t.id}
          style={[styles.toast, wide ? styles.toastWide : null, t.tone === 'danger' ? styles.danger : null]}
          testID="toast"
          role="status"
        >
          <Text variant="label" color="white" style={wide ? styles.messageWide : styles.message}>
            {t.message}
          </Text>
          {t.action ? (
            <Pressable
              testID="toast-action"
              accessibilityRole="button"
              accessibilityLabel={t.action.label}
              style={styles.action}
              onPress={() => {
                t.action?.run();
                dismissToast(t.id);
              }}
            >
              <Text variant="label" color="sunlit">
                {t.action.label}
              </Text>
            </Pressable>
          ) : null}
          <Pressable
            testID="toast-close"
            accessibilityRole="button"
            accessibilityLabel="Dismiss message"
            style={styles.action}
            onPress={() => dismissToast(t.id)}
          >
            <Text variant="label" color="white">
              ×
            </Text>
          </Pressable>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  host: {
    position: 'absolute',
    left: space.lg,
    right: space.lg,
    bottom: 88,
    alignItems: 'center',
    gap: space.sm,
    zIndex: 10,
  },
  // On a wide screen toasts sit at the foot of the side navigation, whose links are all at its top, so they never
  // cover a Save button, a chart or a flag in the panes.
  hostWide: {
    left: space.lg,
    right: 'auto',
    bottom: space.xl,
    width: SIDE_NAV_WIDTH - 2 * space.lg,
    alignItems: 'stretch',
  },
  toast: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    maxWidth: 520,
    width: '100%',
    backgroundColor: colors.ink,
    borderRadius: radii.md,
    paddingLeft: space.lg,
    paddingRight: space.xs,
    paddingVertical: space.xs,
    ...shadow.card,
  },
  // Too narrow for one line there: the message takes the whole width and the buttons wrap below it.
  toastWide: { flexWrap: 'wrap', justifyContent: 'flex-end', paddingLeft: space.md },
  danger: { backgroundColor: colors.emberInk },
  message: { flex: 1, paddingVertical: space.sm },
  messageWide: { width: '100%', paddingTop: space.sm },
  action: { minHeight: 44, minWidth: 44, paddingHorizontal: space.md, alignItems: 'center', justifyContent: 'center' },
});
