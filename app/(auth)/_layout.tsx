import { Stack } from 'expo-router';

export default function AuthLayout() {
  return (
    <Stack screenOptions={{ headerShown: false }}>
      <Stack.Screen name="sign-in" options={{ title: 'Sign in · Trailtally' }} />
      <Stack.Screen name="sign-up" options={{ title: 'Create account · Trailtally' }} />
      <Stack.Screen name="forgot-password" options={{ title: 'Forgot password · Trailtally' }} />
    </Stack>
  );
}
