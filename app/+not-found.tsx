import { NotFoundScreen } from '@/components/shell/NotFoundScreen';

export default function NotFoundRoute() {
  return <NotFoundScreen />;
}
