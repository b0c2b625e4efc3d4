import { useLocalSearchParams } from 'expo-router';
import { ChecklistScreen } from '@/components/build/ChecklistScreen';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { positiveInt } from '@/lib/designs/links';

export default function ChecklistRoute() {
  const { id, n } = useLocalSearchParams<{ id: string; n: string }>();
  const designId = positiveInt(id);
  const number = positiveInt(n);
  if (designId === null || number === null) return <NotFoundScreen />;
  return <ChecklistScreen id={designId} n={number} />;
}
