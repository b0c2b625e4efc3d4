import { useLocalSearchParams, useRouter } from 'expo-router';
import { DesignScreen } from '@/components/designs/DesignScreen';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';
import { positiveInt } from '@/lib/designs/links';

export default function DesignRoute() {
  const { id, version } = useLocalSearchParams<{ id: string; version?: string }>();
  const router = useRouter();
  const designId = positiveInt(id);
  if (designId === null) return <NotFoundScreen />;
  return <DesignScreen id={designId} selected={positiveInt(version)} onSelect={(n) => router.setParams({ version: String(n) })} />;
}
