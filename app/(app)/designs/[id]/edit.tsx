import { useLocalSearchParams } from 'expo-router';
import { EditorScreen } from '@/components/editor/EditorScreen';
import { NotFoundScreen } from '@/components/shell/NotFoundScreen';

/** /designs/:id/edit — the canvas editor of one design (read-only for roles that may not edit). */
export default function EditDesignRoute() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const designId = typeof id === 'string' && /^[1-9]\d{0,8}$/.test(id) ? Number(id) : null;
  return designId === null ? <NotFoundScreen /> : <EditorScreen key={designId} designId={designId} />;
}
