import { useLocalSearchParams, useRouter } from 'expo-router';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { DiffScreen } from '@/components/versions/DiffScreen';
import { positiveInt } from '@/lib/designs/links';

export default function DiffRoute() {
  const { id, from, to } = useLocalSearchParams<{ id: string; from?: string; to?: string }>();
  const router = useRouter();
  const designId = positiveInt(id);
  if (designId === null) return <NotFoundScreen />;
  return (
    <DiffScreen
      id={designId}
      from={positiveInt(from)}
      to={positiveInt(to)}
      onPick={(f, t) => router.setParams({ from: String(f), to: String(t) })}
    />
  );
}
