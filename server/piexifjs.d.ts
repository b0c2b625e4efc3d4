/** The part of piexifjs (1.0, untyped) the photo store uses: EXIF as binary ("latin1") strings. */
declare module 'piexifjs' {
  export type ExifDict = {
    '0th'?: Record<number, unknown>;
    Exif?: Record<number, unknown>;
    GPS?: Record<number, unknown>;
    Interop?: Record<number, unknown>;
    '1st'?: Record<number, unknown>;
    thumbnail?: string | null;
  };
  export function load(data: string): Required<ExifDict>;
  export function dump(exif: ExifDict): string;
  export function insert(exif: string, jpeg: string): string;
  export function remove(jpeg: string): string;
  export const ImageIFD: Record<string, number>;
  export const GPSIFD: Record<string, number>;
  export const ExifIFD: Record<string, number>;
  const piexif: {
    load: typeof load;
    dump: typeof dump;
    insert: typeof insert;
    remove: typeof remove;
    ImageIFD: typeof ImageIFD;
    GPSIFD: typeof GPSIFD;
    ExifIFD: typeof ExifIFD;
  };
  export default piexif;
}
