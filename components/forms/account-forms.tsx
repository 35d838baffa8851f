import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';
import { z } from 'zod';
import { space } from '@/components/theme/tokens';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { Text } from '@/components/ui/text';
import type { PasswordOwner } from '@/shared/password-strength';
import { PASSWORD_HINT, signUpSchema } from '@/shared/schemas/account';
import { authClient } from '@/stores/auth-client';
import { usePreferencesMutation } from '@/stores/queries/preferences';
import { showToast } from '@/stores/toast-store';
import { useUnits } from '@/stores/units-store';
import { authRefusal } from './auth-error';
import { FormTextField } from './form-text-field';
import { passwordProblemOf, usePasswordRulePreload } from './password-rule';
import { showServerRefusal } from './server-refusal';

export function UnitsCard() {
  const units = useUnits();
  const save = usePreferencesMutation();
  return (
    <Card testID="units-card">
      <Text variant="title" role="heading" aria-level={2}>
        Units
      </Text>
      <ChoiceChips
        testID="units"
        label="Show figures in"
        value={units}
        onChange={(v) =>
          save.mutate(
            { units: v },
            {
              onSuccess: () => showToast(v === 'us' ? 'Showing US units' : 'Showing metric units'),
              onError: () => showToast('Saved on this device only; the server did not answer.', { tone: 'danger' }),
            },
          )
        }
        options={[
          { value: 'metric', label: 'Metric (°C, kg, L)' },
          { value: 'us', label: 'US (°F, lb, gal)' },
        ]}
      />
      <Text variant="caption" color="inkSoft">
        Electrical figures stay in watts, watt-hours, amps and volts in both.
      </Text>
    </Card>
  );
}

const nameSchema = signUpSchema.pick({ name: true });
const passwordSchema = z
  .object({
    currentPassword: z.string().min(1, { error: 'Enter your current password.' }),
    newPassword: signUpSchema.shape.password,
    confirm: z.string(),
  })
  .refine((v) => v.newPassword === v.confirm, { message: 'The two new passwords differ.', path: ['confirm'] });

const NAME_ORDER = ['name'] as const;
const PASSWORD_ORDER = ['currentPassword', 'newPassword', 'confirm'] as const;
const fieldIn =
  <F extends string>(order: readonly F[]) =>
  (apiField: string): F | undefined =>
    order.find((f) => f === apiField);

export function NameCard({ name }: { name: string }) {
  const [error, setError] = useState<string>();
  const {
    control,
    handleSubmit,
    formState,
    setError: setFieldError,
  } = useForm<z.infer<typeof nameSchema>>({
    resolver: zodResolver(nameSchema),
    defaultValues: { name },
  });
  const submit = handleSubmit(async (v) => {
    setError(undefined);
    const result = await authClient.updateUser({ name: v.name });
    if (result.error)
      setError(
        showServerRefusal(authRefusal(result.error), {
          order: NAME_ORDER,
          fieldOf: fieldIn(NAME_ORDER),
          setError: setFieldError,
          fallback: 'Your name could not be saved.',
        }),
      );
    else showToast('Name saved');
  });
  return (
    <Card testID="name-card">
      <Text variant="title" role="heading" aria-level={2}>
        Your name
      </Text>
      <FormTextField control={control} name="name" testID="account-name" label="Name" onSubmitEditing={submit} />
      {error ? <Banner testID="name-error" message={error} /> : null}
      <Button
        testID="account-name-save"
        label="Save name"
        busy={formState.isSubmitting}
        disabled={formState.isSubmitting}
        onPress={submit}
      />
    </Card>
  );
}

export function PasswordCard({ owner }: { owner?: PasswordOwner }) {
  const [error, setError] = useState<string>();
  const {
    control,
    handleSubmit,
    formState,
    reset,
    setError: setFieldError,
  } = useForm<z.infer<typeof passwordSchema>>({
    resolver: zodResolver(passwordSchema),
    defaultValues: { currentPassword: '', newPassword: '', confirm: '' },
  });
  usePasswordRulePreload();
  const submit = handleSubmit(async (v) => {
    setError(undefined);
    const problem = await passwordProblemOf(v.newPassword, owner ?? {});
    if (problem) {
      setFieldError('newPassword', { message: problem }, { shouldFocus: true });
      return;
    }
    const result = await authClient.changePassword({
      currentPassword: v.currentPassword,
      newPassword: v.newPassword,
      revokeOtherSessions: true,
    });
    if (result.error) {
      const refusal =
        result.error.code === 'INVALID_PASSWORD'
          ? authRefusal(
              { ...result.error, message: 'Your current password is not right.', fields: undefined },
              {
                INVALID_PASSWORD: 'currentPassword',
              },
            )
          : authRefusal(result.error);
      setError(
        showServerRefusal(refusal, {
          order: PASSWORD_ORDER,
          fieldOf: fieldIn(PASSWORD_ORDER),
          setError: setFieldError,
          fallback: 'The password could not be changed.',
        }),
      );
      return;
    }
    reset();
    showToast('Password changed; other devices were signed out');
  });
  const field = (
    name: 'currentPassword' | 'newPassword' | 'confirm',
    label: string,
    autoComplete: 'current-password' | 'new-password',
    hint?: string,
  ) => (
    <FormTextField
      control={control}
      name={name}
      testID={`account-${name}`}
      label={label}
      secureTextEntry
      autoComplete={autoComplete}
      hint={hint}
    />
  );
  return (
    <Card testID="password-card">
      <Text variant="title" role="heading" aria-level={2}>
        Password
      </Text>
      <View style={styles.fields}>
        {field('currentPassword', 'Current password', 'current-password')}
        {field('newPassword', 'New password', 'new-password', PASSWORD_HINT)}
        {field('confirm', 'New password again', 'new-password')}
      </View>
      {error ? <Banner testID="password-error" message={error} /> : null}
      <Button
        testID="account-password-save"
        label="Change password"
        busy={formState.isSubmitting}
        disabled={formState.isSubmitting}
        onPress={submit}
      />
    </Card>
  );
}

const styles = StyleSheet.create({ fields: { gap: space.md } });
