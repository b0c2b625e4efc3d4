import { useLocalSearchParams } from 'expo-router';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { VersionScreen } from '@/components/versions/VersionScreen';
import { positiveInt } from '@/lib/designs/links';

export default function VersionRoute() {
  const { id, n } = useLocalSearchParams<{ id: string; n: string }>();
  const designId = positiveInt(id);
  const number = positiveInt(n);
  if (designId === null || number === null) return <NotFoundScreen />;
  return <VersionScreen id={designId} n={number} />;
}
