/** Device shapes are shared with the pattern builders (shared/layout/shape.ts), so patterns place boxes by their drawn size. */
export * from '@/shared/layout/shape';
