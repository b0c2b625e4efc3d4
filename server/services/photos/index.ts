import { randomUUID } from 'node:crypto';
import type { User } from '@/shared/api/auth';
import type { Photo, PhotoFields, PhotoType } from '@/shared/api/build';
import { loadPeople, toPhoto } from '@/server/services/build/dto';
import type { BuildDeps } from '@/server/services/build/deps';
import { openForMarking } from '@/server/services/build/open';
import { findVersion, loadDesignView } from '@/server/services/designs/load';
import { fail, invalid, ok, type Result } from '@/server/services/result';
import { PhotoTooSlowError, preparePhotoOffThread } from './photo-pool';

/**
 * Photos of a build record: attached to one cable or one rack of an approved version by an
 * installer or an admin; read back by the version's team only (installers: approved versions).
 * The type is judged from the content (JPEG, PNG or WebP, else 415), location metadata is removed
 * before anything is written (prepare.ts), and the file gets a random name (store.ts).
 */
export type UploadedFile = { buffer: Buffer; size: number };
export type PhotoFile = { contentType: PhotoType; body: Buffer; id: string };

export const NO_SUCH_PHOTO = 'There is no such photo in your team.';
export const WRONG_TYPE = 'This file is not a JPEG, PNG or WebP image. Take the photo with the camera, or choose a JPEG, PNG or WebP file.';

export function createPhotoService(deps: BuildDeps) {
  const { models, photos, now } = deps;

  return {
    async upload(viewer: User, id: number, n: number, fields: PhotoFields, file: UploadedFile | undefined): Promise<Result<Photo>> {
      const opened = await openForMarking(deps, viewer, id, n);
      if (!opened.ok) return opened;
      const { doc, record, view } = opened.value;
      if (!file) return invalid([{ path: 'photo', message: 'Attach the image in the multipart field "photo"' }]);
      if (fields.cableId !== undefined && !doc.cables.some((c) => c.id === fields.cableId)) {
        return invalid([{ path: 'cableId', message: `Version ${n} has no cable ${JSON.stringify(fields.cableId)}` }]);
      }
      if (fields.rackId !== undefined && !(doc.racks ?? []).some((r) => r.id === fields.rackId)) {
        return invalid([{ path: 'rackId', message: `Version ${n} has no rack ${JSON.stringify(fields.rackId)}` }]);
      }
      let prepared;
      try {
        prepared = await preparePhotoOffThread(file.buffer);
      } catch (error) {
        if (error instanceof PhotoTooSlowError) return fail('unavailable', 'The photo took too long to check; try again in a minute.');
        throw error;
      }
      if (!prepared.ok) {
        if (prepared.reason === 'type') return fail('unsupported-type', WRONG_TYPE);
        return invalid([{ path: 'photo', message: `${prepared.message} Take the photo again.` }]);
      }
      const storedName = await photos.write(prepared.bytes, prepared.extension);
      try {
        const row = await models.BuildPhoto.create({
          id: randomUUID(),
          designId: view.design.id,
          versionId: record.row.id,
          versionNumber: n,
          cableId: fields.cableId ?? null,
          rackId: fields.rackId ?? null,
          authorId: viewer.id,
          contentType: prepared.contentType,
          bytes: prepared.bytes.byteLength,
          storedName,
          createdAt: now(),
        });
        return ok(toPhoto(row, await loadPeople(models, [viewer.id])));
      } catch (error) {
        await photos.discard(storedName);
        throw error;
      }
    },

    /** The image, for the team of its design only; anyone else hears it does not exist. */
    async read(viewer: User, photoId: string): Promise<Result<PhotoFile>> {
      const row = await models.BuildPhoto.findByPk(photoId);
      if (!row) return fail('not-found', NO_SUCH_PHOTO);
      const view = await loadDesignView(models, viewer, row.designId);
      if (!view || !findVersion(view, row.versionNumber)) return fail('not-found', NO_SUCH_PHOTO);
      try {
        return ok({ contentType: row.contentType, body: await photos.read(row.storedName), id: row.id });
      } catch (error) {
        if ((error as NodeJS.ErrnoException).code !== 'ENOENT') throw error;
        console.error(`Photo ${row.id} has a record but no file in the photo folder.`);
        return fail('not-found', NO_SUCH_PHOTO);
      }
    },
  };
}

export type PhotoService = ReturnType<typeof createPhotoService>;
