import { Pressable, StyleSheet, View } from 'react-native';
import { useIsWide } from '@/components/theme/breakpoints';
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
          style={[styles.toast, t.tone === 'danger' ? styles.danger : null]}
          testID="toast"
          role="status"
        >
          <Text variant="label" color="white" style={styles.message}>
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
  // On a wide screen the corner keeps toasts off the chart and the flags.
  hostWide: { left: 'auto', right: space.xl, bottom: space.xl, width: 420, alignItems: 'stretch' },
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
  danger: { backgroundColor: colors.emberInk },
  message: { flex: 1, paddingVertical: space.sm },
  action: { minHeight: 44, minWidth: 44, paddingHorizontal: space.md, alignItems: 'center', justifyContent: 'center' },
});
