import { useLocalSearchParams } from 'expo-router';
import { ScheduleScreen } from '@/components/cables/ScheduleScreen';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { positiveInt } from '@/lib/designs/links';

export default function ScheduleRoute() {
  const { id, n } = useLocalSearchParams<{ id: string; n: string }>();
  const designId = positiveInt(id);
  const number = positiveInt(n);
  if (designId === null || number === null) return <NotFoundScreen />;
  return <ScheduleScreen id={designId} n={number} />;
}
