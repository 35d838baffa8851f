import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { Controller, useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { ROLE_LABEL } from '@/components/trip/role-label';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { FormTextField } from '@/components/forms/form-text-field';
import { ChoiceChips } from '@/components/ui/choice-chips';
import type { Role } from '@/shared/schemas/roles';
import { inviteRoleSchema } from '@/shared/schemas/sharing';
import { ApiError } from '@/stores/queries/api-client';
import { useInviteCreateMutation } from '@/stores/queries/members';
import { showToast } from '@/stores/toast-store';
import { grantableRoles } from './grantable-roles';

// The form keeps the note as typed ('' when empty); the request leaves it out then.
const inviteFormSchema = z.object({
  email: z.email({ error: 'Enter an e-mail address like name@example.com.' }).max(254),
  role: inviteRoleSchema,
  message: z.string().trim().max(500, { error: 'Keep the note under 500 characters.' }),
});
type InviteFormValues = z.infer<typeof inviteFormSchema>;

const FIELDS = ['email', 'role', 'message'] as const;

export function InviteForm({ tripId, myRole }: { tripId: string; myRole: Role }) {
  const roles = grantableRoles(myRole);
  const create = useInviteCreateMutation(tripId);
  const [formError, setFormError] = useState<string>();
  const { control, handleSubmit, formState, setError, reset } = useForm<InviteFormValues>({
    resolver: zodResolver(inviteFormSchema),
    defaultValues: { email: '', role: roles.includes('crew') ? 'crew' : (roles[0] ?? 'viewer'), message: '' },
  });

  const submit = handleSubmit(async (values) => {
    setFormError(undefined);
    try {
      await create.mutateAsync({
        email: values.email,
        role: values.role,
        ...(values.message ? { message: values.message } : {}),
      });
      showToast(`Invite sent to ${values.email}.`);
      // Keep the chosen role for the next person; clear who and what.
      reset({ email: '', role: values.role, message: '' });
    } catch (error) {
      if (!(error instanceof ApiError)) return setFormError('That did not work. Please try again.');
      if (error.code === 'mail_failed') {
        // The invite is saved and listed as not sent, with Retry beside it; the form is free for the next one.
        setFormError(error.message);
        reset({ email: '', role: values.role, message: '' });
        return;
      }
      const fieldErrors = FIELDS.filter((field) => error.fields?.[field]?.[0]);
      fieldErrors.forEach((field) => setError(field, { message: error.fields?.[field]?.[0] }));
      // "Already a member" is about the address, so it belongs beside it.
      if (error.status === 422) setError('email', { message: error.message });
      else if (fieldErrors.length === 0) setFormError(error.message);
    }
  });

  return (
    <View style={styles.form} testID="invite-form">
      {formError ? <Banner testID="invite-error" message={formError} /> : null}
      <FormTextField
        control={control}
        name="email"
        testID="invite-email"
        label="E-mail"
        inputMode="email"
        autoCapitalize="none"
        autoComplete="off"
        onSubmitEditing={submit}
      />
      <Controller
        control={control}
        name="role"
        render={({ field }) => (
          <ChoiceChips
            testID="invite-role"
            label="Role"
            options={roles.map((role) => ({ value: role, label: ROLE_LABEL[role] }))}
            value={field.value}
            onChange={field.onChange}
          />
        )}
      />
      <FormTextField
        control={control}
        name="message"
        testID="invite-message"
        label="Note (optional)"
        hint="Goes into the e-mail, e.g. which appliances are theirs."
        multiline
        numberOfLines={3}
        style={styles.note}
      />
      <Button
        testID="invite-submit"
        label="Send invite"
        busy={formState.isSubmitting}
        onPress={submit}
        style={styles.submit}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: space.lg },
  note: { minHeight: 80, paddingTop: space.sm, textAlignVertical: 'top' },
  submit: { alignSelf: 'flex-start' },
});
