import { createContext, useContext } from 'react';

/**
 * True while the signed-in layout is still checking the session (or sending a signed-out visitor to
 * sign-in) with its screens mounted but hidden. Team-scoped queries wait for it, so a signed-out visit
 * does not send requests that can only answer 401. Outside that layout it is false.
 */
export const SessionPendingContext = createContext(false);

export function useSessionPending(): boolean {
  return useContext(SessionPendingContext);
}
