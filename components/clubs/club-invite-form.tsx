import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/stores/queries/api-client';
import { useClubInviteMutation, type ClubInviteResult } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';
import { CsvFileButton } from './csv-file-button';

function Report({ report }: { report: ClubInviteResult }) {
  return (
    <View style={styles.report} testID="club-invite-report" role="status" aria-live="polite">
      <Text variant="label" color="pine" testID="club-invite-sent">
        {report.sent.length} {report.sent.length === 1 ? 'invite' : 'invites'} sent
        {report.alreadyMembers > 0 ? ` · ${report.alreadyMembers} already in the club` : ''}
      </Text>
      {report.rejected.length > 0 ? (
        <View style={styles.rejected} testID="club-invite-rejected">
          <Text variant="label" color="ember">
            {report.rejected.length} {report.rejected.length === 1 ? 'row was' : 'rows were'} not sent:
          </Text>
          {report.rejected.map((row, i) => (
            <Text key={`${row.line}-${i}`} variant="caption" testID={`club-invite-rejected-${i}`}>
              {row.line > 0 ? `Line ${row.line}: ` : ''}“{row.value}” — {row.reason}
            </Text>
          ))}
          <Text variant="caption" color="inkSoft">
            Fix those addresses and send them again; the others are on their way.
          </Text>
        </View>
      ) : null}
    </View>
  );
}

/** Many households at once: paste addresses and/or choose a CSV of names and e-mails. */
export function ClubInviteForm({ clubId }: { clubId: string }) {
  const invite = useClubInviteMutation(clubId);
  const [addresses, setAddresses] = useState('');
  const [csv, setCsv] = useState<{ name: string; text: string }>();
  const [fieldError, setFieldError] = useState<string>();
  const [formError, setFormError] = useState<string>();
  const [report, setReport] = useState<ClubInviteResult>();

  const send = async () => {
    setFieldError(undefined);
    setFormError(undefined);
    if (!addresses.trim() && !csv) return setFieldError('Paste some addresses or choose a CSV file.');
    try {
      const result = await invite.mutateAsync({
        ...(addresses.trim() ? { addresses } : {}),
        ...(csv ? { csv: csv.text } : {}),
      });
      setReport(result);
      showToast(`${result.sent.length} ${result.sent.length === 1 ? 'invite' : 'invites'} sent.`);
      // Keep only what failed in the box, so nothing typed is lost and the rest is not sent twice.
      setAddresses(result.rejected.map((row) => row.value).join('\n'));
      setCsv(undefined);
    } catch (error) {
      const message =
        error instanceof ApiError
          ? (error.fields?.addresses?.[0] ?? error.message)
          : 'That did not work. Please try again.';
      if (error instanceof ApiError && error.fields?.addresses) setFieldError(message);
      else setFormError(message);
    }
  };

  return (
    <View style={styles.form} testID="club-invite-form">
      {formError ? <Banner testID="club-invite-error" message={formError} /> : null}
      <TextField
        testID="club-invite-addresses"
        label="E-mail addresses"
        hint="One per line or separated by commas; “Name <name@example.com>” works too."
        multiline
        numberOfLines={6}
        autoCapitalize="none"
        value={addresses}
        onChangeText={setAddresses}
        error={fieldError}
        style={styles.box}
      />
      <View style={styles.row}>
        <CsvFileButton testID="club-invite-csv" disabled={invite.isPending} onLoaded={setCsv} onError={setFormError} />
        {csv ? (
          <View style={styles.file} testID="club-invite-csv-chosen">
            <Text variant="caption">{csv.name}</Text>
            <Button
              testID="club-invite-csv-clear"
              label="Remove"
              accessibilityLabel={`Remove ${csv.name}`}
              tone="quiet"
              onPress={() => setCsv(undefined)}
            />
          </View>
        ) : null}
      </View>
      <Text variant="caption" color="inkSoft">
        CSV: one household per row, name then e-mail (a header row is fine).
      </Text>
      <Button
        testID="club-invite-submit"
        label="Send invites"
        busy={invite.isPending}
        onPress={() => void send()}
        style={styles.submit}
      />
      {report ? <Report report={report} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.md },
  box: { minHeight: 140, paddingTop: space.sm, textAlignVertical: 'top' },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm },
  file: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  submit: { alignSelf: 'flex-start' },
  report: {
    gap: space.sm,
    padding: space.md,
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.dune,
  },
  rejected: { gap: space.xs },
});
