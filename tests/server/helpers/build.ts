import { randomUUID } from 'node:crypto';
import piexif from 'piexifjs';
import type { Agent } from './app';

/** For the build record tests: paths, marks, and small real images. */
export const buildPath = (id: number, n: number, rest = '') => `/api/designs/${id}/versions/${n}/build${rest}`;

export const newClientId = () => randomUUID();

export function markCable(agent: Agent, id: number, n: number, body: { cableId: string; state: string; note?: string; clientId?: string }) {
  return agent.post(buildPath(id, n, '/marks')).send({ clientId: newClientId(), ...body });
}

export function markStep(agent: Agent, id: number, n: number, body: { stepId: string; done: boolean; note?: string; clientId?: string }) {
  return agent.post(buildPath(id, n, '/steps')).send({ clientId: newClientId(), ...body });
}

/** An 8×8 baseline JPEG with a JFIF APP0 segment (made once with an encoder and kept here). */
export const JPEG_8X8 = Buffer.from(
  '/9j/4AAQSkZJRgABAQAAAQABAAD/2wCEAAYEBQYFBAYGBQYHBwYIChAKCgkJChQODwwQFxQYGBcUFhYaHSUfGhsjHBYWICwgIyYnKSopGR8tMC0oMCUoKSgBBwcHCggKEwoKEygaFhooKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKCgoKP/AABEIAAgACAMBEQACEQEDEQH/xAGiAAABBQEBAQEBAQAAAAAAAAAAAQIDBAUGBwgJCgsQAAIBAwMCBAMFBQQEAAABfQECAwAEEQUSITFBBhNRYQcicRQygZGhCCNCscEVUtHwJDNicoIJChYXGBkaJSYnKCkqNDU2Nzg5OkNERUZHSElKU1RVVldYWVpjZGVmZ2hpanN0dXZ3eHl6g4SFhoeIiYqSk5SVlpeYmZqio6Slpqeoqaqys7S1tre4ubrCw8TFxsfIycrS09TV1tfY2drh4uPk5ebn6Onq8fLz9PX29/j5+gEAAwEBAQEBAQEBAQAAAAAAAAECAwQFBgcICQoLEQACAQIEBAMEBwUEBAABAncAAQIDEQQFITEGEkFRB2FxEyIygQgUQpGhscEJIzNS8BVictEKFiQ04SXxFxgZGiYnKCkqNTY3ODk6Q0RFRkdISUpTVFVWV1hZWmNkZWZnaGlqc3R1dnd4eXqCg4SFhoeIiYqSk5SVlpeYmZqio6Slpqeoqaqys7S1tre4ubrCw8TFxsfIycrS09TV1tfY2dri4+Tl5ufo6ery8/T19vf4+fr/2gAMAwEAAhEDEQA/AOTr7E+cP//Z',
  'base64',
);

/** An 8×8 PNG. */
export const PNG_8X8 = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAgAAAAICAYAAADED76LAAAAJUlEQVR4AYXBAQEAIAyAMKSSnQxnSd9AtrXPfXxIkCBBggQJEgZWfQJSzhbQKQAAAABJRU5ErkJggg==',
  'base64',
);

/** A 1×1 lossless WebP. */
export const WEBP_1X1 = Buffer.from('UklGRhoAAABXRUJQVlA4TA0AAAAvAAAAEAcQERGIiP4HAA==', 'base64');

/**
 * The 8×8 JPEG with EXIF written by piexifjs: orientation 6 (rotated 90° clockwise), a camera make,
 * and GPS tags for a point at sea (invented), plus an XMP packet that repeats the position.
 */
export function jpegWithLocation(): Buffer {
  const exif = piexif.dump({
    '0th': { [piexif.ImageIFD.Orientation]: 6, [piexif.ImageIFD.Make]: 'Example Camera' },
    GPS: {
      [piexif.GPSIFD.GPSLatitudeRef]: 'N',
      [piexif.GPSIFD.GPSLatitude]: [
        [10, 1],
        [20, 1],
        [3000, 100],
      ],
      [piexif.GPSIFD.GPSLongitudeRef]: 'W',
      [piexif.GPSIFD.GPSLongitude]: [
        [40, 1],
        [50, 1],
        [0, 1],
      ],
    },
  });
  const withExif = Buffer.from(piexif.insert(exif, JPEG_8X8.toString('latin1')), 'latin1');
  const xmp = Buffer.from('http://ns.adobe.com/xap/1.0/\0<x:xmpmeta><exif:GPSLatitude>10,20.5N</exif:GPSLatitude></x:xmpmeta>', 'latin1');
  const head = Buffer.from([0xff, 0xe1, 0, 0]);
  head.writeUInt16BE(xmp.length + 2, 2);
  // After SOI and the EXIF segment piexif put first.
  const exifEnd = 2 + 2 + withExif.readUInt16BE(4);
  return Buffer.concat([withExif.subarray(0, exifEnd), head, xmp, withExif.subarray(exifEnd)]);
}
