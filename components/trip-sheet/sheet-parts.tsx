// Building blocks of the trip sheet: plain bordered tables and headed sections that read in black and white.
import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, fonts, space } from '@/components/theme/tokens';
import { Text } from '@/components/ui/text';

export function Section({ title, children, testID }: { title: string; children: ReactNode; testID: string }) {
  return (
    <View style={styles.section} testID={testID}>
      <Text variant="label" role="heading" aria-level={2} style={styles.heading}>
        {title}
      </Text>
      {children}
    </View>
  );
}

export type Column = { title: string; flex: number; align?: 'right' };

/** A table as rows of text; with table roles, so a screen reader can move by row and column. */
export function Table({ columns, rows, testID }: { columns: Column[]; rows: string[][]; testID: string }) {
  const cell = (text: string, column: Column | undefined, header: boolean, key: number) => (
    <Text
      key={key}
      variant="caption"
      role={header ? 'columnheader' : 'cell'}
      style={[
        styles.cell,
        { flex: column?.flex ?? 1 },
        column?.align === 'right' ? styles.right : null,
        header ? styles.headerCell : null,
      ]}
    >
      {text}
    </Text>
  );
  return (
    <View role="table" style={styles.table} testID={testID}>
      <View role="row" style={[styles.row, styles.headerRow]}>
        {columns.map((c, i) => cell(c.title, c, true, i))}
      </View>
      {rows.map((row, r) => (
        <View key={r} role="row" style={styles.row}>
          {row.map((text, i) => cell(text, columns[i], false, i))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: space.xs },
  heading: { borderBottomWidth: 2, borderBottomColor: colors.ink, paddingBottom: 2 },
  table: { borderTopWidth: 1, borderColor: colors.ink },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderColor: colors.line },
  headerRow: { borderColor: colors.ink },
  cell: { paddingVertical: 2, paddingHorizontal: 3, color: colors.ink, fontSize: 11, lineHeight: 14 },
  headerCell: { fontFamily: fonts.bold },
  right: { textAlign: 'right' },
});
