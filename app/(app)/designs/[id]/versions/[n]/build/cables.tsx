import { useLocalSearchParams } from 'expo-router';
import { CablesToDo } from '@/components/build/CablesToDo';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { positiveInt } from '@/lib/designs/links';

export default function CablesToDoRoute() {
  const { id, n, rack } = useLocalSearchParams<{ id: string; n: string; rack?: string }>();
  const designId = positiveInt(id);
  const number = positiveInt(n);
  if (designId === null || number === null) return <NotFoundScreen />;
  return <CablesToDo id={designId} n={number} rackId={typeof rack === 'string' && rack ? rack : null} />;
}
