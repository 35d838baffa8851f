import { OutboxScreen } from '@/components/outbox/outbox-screen';

// Outside the signed-in group: an invitee reads their invite here before they have an account.
export default function OutboxRoute() {
  return <OutboxScreen />;
}
