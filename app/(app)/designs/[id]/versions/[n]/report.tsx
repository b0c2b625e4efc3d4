import { useLocalSearchParams } from 'expo-router';
import { ReportScreen } from '@/components/report/ReportScreen';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { positiveInt } from '@/lib/designs/links';

export default function ReportRoute() {
  const { id, n } = useLocalSearchParams<{ id: string; n: string }>();
  const designId = positiveInt(id);
  const number = positiveInt(n);
  if (designId === null || number === null) return <NotFoundScreen />;
  return <ReportScreen id={designId} n={number} />;
}
