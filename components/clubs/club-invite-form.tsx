import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/stores/queries/api-client';
import { MAX_CLUB_INVITES_PER_REQUEST } from '@/shared/schemas/sharing';
import { useClubInviteMutation, type ClubInviteResult } from '@/stores/queries/clubs';
import { showToast } from '@/stores/toast-store';
import { CsvFileButton } from './csv-file-button';

type Line = { key: string; text: string };

function LineList({
  title,
  lines,
  tone,
  testID,
}: {
  title: string;
  lines: Line[];
  tone: 'ember' | 'ink';
  testID: string;
}) {
  if (lines.length === 0) return null;
  return (
    <View style={styles.lines} testID={testID}>
      <Text variant="label" color={tone === 'ember' ? 'emberInk' : 'ink'}>
        {title}
      </Text>
      {lines.map((line, i) => (
        <Text key={line.key} variant="caption" testID={`${testID}-${i}`}>
          {line.text}
        </Text>
      ))}
    </View>
  );
}

const at = (line: number) => (line > 0 ? `Line ${line}: ` : '');
const count = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** What happened to every address: sent, not sent (retry from the list), left out on purpose, or not an address. */
function Report({ report }: { report: ClubInviteResult }) {
  const members = report.skipped.filter((row) => row.why === 'member').length;
  const waiting = report.skipped.length - members;
  return (
    <View style={styles.report} testID="club-invite-report" role="status" aria-live="polite">
      <Text variant="label" color="pine" testID="club-invite-sent">
        {count(report.sent.length, 'invite', 'invites')} sent
        {members > 0 ? ` · ${members} already in the club` : ''}
        {waiting > 0 ? ` · ${waiting} already invited, not sent again` : ''}
      </Text>
      <LineList
        testID="club-invite-failed"
        tone="ember"
        title={`${count(report.failed.length, 'invite was', 'invites were')} saved but not sent — use Retry under “Waiting to join”:`}
        lines={report.failed.map((row) => ({ key: row.email, text: `${row.email} — ${row.reason}` }))}
      />
      <LineList
        testID="club-invite-skipped"
        tone="ink"
        title="Left out:"
        lines={report.skipped.map((row) => ({ key: row.email, text: `${at(row.line)}${row.email} — ${row.reason}` }))}
      />
      <LineList
        testID="club-invite-rejected"
        tone="ember"
        title={`${count(report.rejected.length, 'row was', 'rows were')} not sent:`}
        lines={report.rejected.map((row, i) => ({
          key: `${row.line}-${i}`,
          text: `${at(row.line)}“${row.value}” — ${row.reason}`,
        }))}
      />
      {report.rejected.length > 0 ? (
        <Text variant="caption" color="inkSoft">
          Fix those addresses and send them again; the others are on their way.
        </Text>
      ) : null}
    </View>
  );
}

/** A 502's body carries the report of what was saved and what was not. */
function reportOf(error: ApiError): ClubInviteResult | undefined {
  const report = (error.body as { report?: ClubInviteResult } | undefined)?.report;
  return report && Array.isArray(report.sent) ? report : undefined;
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
      showToast(`${count(result.sent.length, 'invite', 'invites')} sent.`);
      // Keep only what failed in the box, so nothing typed is lost and the rest is not sent twice.
      setAddresses(result.rejected.map((row) => row.value).join('\n'));
      setCsv(undefined);
    } catch (error) {
      if (!(error instanceof ApiError)) return setFormError('That did not work. Please try again.');
      const saved = reportOf(error);
      if (saved) {
        // The mail server failed: the invites are saved and wait for Retry, so the box is cleared of them.
        setReport(saved);
        setAddresses(saved.rejected.map((row) => row.value).join('\n'));
        setCsv(undefined);
      }
      if (error.fields?.addresses?.[0]) setFieldError(error.fields.addresses[0]);
      else setFormError(error.fields?.csv?.[0] ?? error.message);
    }
  };

  return (
    <View style={styles.form} testID="club-invite-form">
      {formError ? <Banner testID="club-invite-error" message={formError} /> : null}
      <TextField
        testID="club-invite-addresses"
        label="E-mail addresses"
        hint={`One per line or separated by commas; “Name <name@example.com>” works too. Up to ${MAX_CLUB_INVITES_PER_REQUEST} at a time.`}
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
  lines: { gap: space.xs },
});
