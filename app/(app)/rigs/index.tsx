import { MyRigsScreen } from '@/components/rig/my-rigs-screen';

export default function RigsRoute() {
  return <MyRigsScreen />;
}
