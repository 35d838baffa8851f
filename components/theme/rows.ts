import { StyleSheet } from 'react-native';
import { colors, space } from './tokens';

/** A list row that wraps its actions under its text on a narrow screen, with a line under it. */
export const rowStyles = StyleSheet.create({
  wrapping: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: space.sm,
    paddingVertical: space.sm,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
  /** The row's text: takes the room left, and never gets narrower than a short name. */
  text: { flex: 1, minWidth: 160 },
});
