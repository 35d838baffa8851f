import { useLocalSearchParams } from 'expo-router';
import { SavedRigScreen } from '@/components/rig/saved-rig-screen';

export default function SavedRigRoute() {
  const { rigId } = useLocalSearchParams<{ rigId: string }>();
  return <SavedRigScreen rigId={rigId} />;
}
