import { useLocalSearchParams } from 'expo-router';
import { CableMarks } from '@/components/build/CableMarks';
import { CableDetailScreen } from '@/components/cables/CableDetailScreen';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { positiveInt } from '@/lib/designs/links';

export default function CableDetailRoute() {
  const { id, n, cableId } = useLocalSearchParams<{ id: string; n: string; cableId: string }>();
  const designId = positiveInt(id);
  const number = positiveInt(n);
  if (designId === null || number === null || typeof cableId !== 'string' || cableId === '') return <NotFoundScreen />;
  return (
    <CableDetailScreen id={designId} n={number} cableId={cableId}>
      <CableMarks designId={designId} version={number} cableId={cableId} />
    </CableDetailScreen>
  );
}
