import { useRouter } from 'expo-router';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { NewTripForm } from '@/components/forms/new-trip-form';
import { showToast } from '@/stores/toast-store';

export default function NewTripRoute() {
  const router = useRouter();
  return (
    <Screen
      testID="new-trip-screen"
      title="New trip"
      subtitle="Name it, give its dates and pick the rig it runs on. Stops and appliances come next."
    >
      <Card>
        <NewTripForm
          onCreated={(detail) => {
            showToast(`“${detail.trip.name}” created. Add its first stop.`);
            router.replace(`/trips/${detail.trip.id}/route`);
          }}
        />
      </Card>
    </Screen>
  );
}
