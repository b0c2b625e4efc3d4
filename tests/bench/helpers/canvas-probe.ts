/**
 * Runs in the page (passed to page.evaluate, so it must not close over anything). Times each
 * pointer move of a drag from its event to the end of the redraw: the capture listener notes when
 * the move arrives, and the first DOM change after it — React commits a move in one go, and the
 * mutation observer runs right after that commit — forces style and layout of the dragged device
 * and notes the time ("work"). A second figure waits for the next frame to be produced after the
 * move (requestAnimationFrame, then a message posted from it, which runs after paint): it includes
 * the idle wait for the display's next frame, so it is an upper bound.
 */
export function installProbe(deviceTestId: string): void {
  const w = window as unknown as { __probe: { work: number[]; frame: number[]; moves: number; idle: number } };
  const probe = { work: [] as number[], frame: [] as number[], moves: 0, idle: 0 };
  w.__probe = probe;
  const svg = document.querySelector('[data-testid="canvas-svg"]');
  const target = document.querySelector(`[data-testid="${deviceTestId}"]`);
  if (!svg || !target) throw new Error('canvas or device not found');
  let start: number | null = null;
  window.addEventListener(
    'pointermove',
    (e) => {
      if (!e.buttons) return;
      probe.moves += 1;
      if (start !== null) probe.idle += 1;
      start = performance.now();
    },
    true,
  );
  new MutationObserver(() => {
    if (start === null) return;
    const began = start;
    start = null;
    target.getBoundingClientRect();
    probe.work.push(performance.now() - began);
    requestAnimationFrame(() => {
      const channel = new MessageChannel();
      channel.port1.onmessage = () => probe.frame.push(performance.now() - began);
      channel.port2.postMessage(0);
    });
  }).observe(svg, { attributes: true, childList: true, subtree: true, characterData: true });
}
