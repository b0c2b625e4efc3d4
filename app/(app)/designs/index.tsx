import { DesignsScreen } from '@/components/designs/DesignsScreen';

export default function DesignsRoute() {
  return <DesignsScreen />;
}
