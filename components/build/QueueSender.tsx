import { useQueueSender } from '@/lib/api/build';

/** Keeps the phone's queue of marks moving on every signed-in screen (lib/api/build.ts); draws nothing. */
export function QueueSender() {
  useQueueSender();
  return null;
}
