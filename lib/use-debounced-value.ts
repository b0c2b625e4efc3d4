import { useEffect, useState } from 'react';

/** The value, once it has held still for `delayMs`: keeps heavy recomputation off every keystroke or tap. */
export function useDebouncedValue<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}
