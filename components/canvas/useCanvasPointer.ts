import { useEffect, type RefObject } from 'react';
import type { View } from 'react-native';
import type { Gestures, PointerKind } from '@/lib/editor/gestures';

/**
 * Connects the DOM's pointer and wheel events of the canvas element to the gesture controller.
 * Native listeners, not React props: the wheel must be non-passive so ctrl+wheel (trackpad pinch)
 * zooms the canvas and not the page, and `touch-action: none` keeps the browser from panning.
 */
export function useCanvasPointer(ref: RefObject<View | null>, gestures: Gestures) {
  useEffect(() => {
    const node = ref.current as unknown as HTMLElement | null;
    if (!node || typeof node.addEventListener !== 'function') return;
    node.style.touchAction = 'none';
    node.style.userSelect = 'none';
    const point = (e: { clientX: number; clientY: number }) => {
      const rect = node.getBoundingClientRect();
      return { x: e.clientX - rect.left, y: e.clientY - rect.top };
    };
    const input = (e: PointerEvent) => ({
      id: e.pointerId,
      kind: (e.pointerType || 'mouse') as PointerKind,
      point: point(e),
      button: e.button,
      additive: e.shiftKey || e.ctrlKey || e.metaKey,
    });
    const onDown = (e: PointerEvent) => {
      if (e.button === 2) return;
      // Focus stays with the page (keyboard shortcuts), not a field the designer left.
      (document.activeElement as HTMLElement | null)?.blur?.();
      node.setPointerCapture?.(e.pointerId);
      gestures.down(input(e));
      e.preventDefault();
    };
    const onMove = (e: PointerEvent) => gestures.move(input(e));
    const onUp = (e: PointerEvent) => {
      node.releasePointerCapture?.(e.pointerId);
      gestures.up(input(e));
    };
    const onCancel = (e: PointerEvent) => gestures.cancel(input(e));
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      // Line-mode wheels (deltaMode 1) report lines, not pixels.
      gestures.wheel(point(e), e.deltaMode === 1 ? e.deltaY * 16 : e.deltaY, e.ctrlKey);
    };
    node.addEventListener('pointerdown', onDown);
    node.addEventListener('pointermove', onMove);
    node.addEventListener('pointerup', onUp);
    node.addEventListener('pointercancel', onCancel);
    node.addEventListener('wheel', onWheel, { passive: false });
    return () => {
      node.removeEventListener('pointerdown', onDown);
      node.removeEventListener('pointermove', onMove);
      node.removeEventListener('pointerup', onUp);
      node.removeEventListener('pointercancel', onCancel);
      node.removeEventListener('wheel', onWheel);
    };
  }, [ref, gestures]);
}
