import { useLocalSearchParams } from 'expo-router';
import { LabelSheetScreen } from '@/components/cables/LabelSheetScreen';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { positiveInt } from '@/lib/designs/links';

export default function LabelSheetRoute() {
  const { id, n } = useLocalSearchParams<{ id: string; n: string }>();
  const designId = positiveInt(id);
  const number = positiveInt(n);
  if (designId === null || number === null) return <NotFoundScreen />;
  return <LabelSheetScreen id={designId} n={number} />;
}
