import { SiteHomeScreen } from '@/components/build/SiteHomeScreen';
import { RequireCapability } from '@/components/shell/RequireCapability';

export default function SiteRoute() {
  return (
    <RequireCapability capability="markBuild" screen="Site work">
      <SiteHomeScreen />
    </RequireCapability>
  );
}
