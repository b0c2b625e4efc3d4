/**
 * Geometry of the canvas, as pure functions: device shapes, the render snapshot, hit-testing and
 * viewport math. The canvas imports from here only.
 */
export * from '@/lib/editor/shape';
export * from '@/lib/editor/snapshot';
export * from '@/lib/editor/hit-test';
export * from '@/lib/editor/viewport';
