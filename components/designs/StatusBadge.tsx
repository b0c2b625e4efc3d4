import { Badge } from '@/components/ui';
import { STATUS_LABELS, STATUS_TONES } from '@/lib/designs/summary';
import type { DesignStatus } from '@/shared/api/designs';

/** A design's or version's review state in words; the tint only helps scanning. */
export function StatusBadge({ status, testID }: { status: DesignStatus; testID?: string }) {
  return <Badge label={STATUS_LABELS[status]} tone={STATUS_TONES[status]} testID={testID} />;
}
