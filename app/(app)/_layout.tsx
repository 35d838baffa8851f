import { Slot } from 'expo-router';
import { AppShell } from '@/components/layout/app-shell';

export default function SignedInLayout() {
  return (
    <AppShell>
      <Slot />
    </AppShell>
  );
}
