import { preparePhoto, type PreparedPhoto } from '@/server/services/photos/prepare';

/** Worker entry (piscina): judge one uploaded photo by its content and strip its location metadata, off the request thread. */
export default async function preparePhotoTask(task: { bytes: Uint8Array }): Promise<PreparedPhoto> {
  return preparePhoto(Buffer.from(task.bytes.buffer, task.bytes.byteOffset, task.bytes.byteLength));
}
