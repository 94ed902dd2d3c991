import { useCallback, useEffect, useRef } from "react";
import { useBlocker } from "react-router-dom";

/**
 * Warns before unsaved changes are left behind: the browser's own prompt on reload or close, and a
 * blocker for links inside the app (the caller asks its question while `blocker.state === "blocked"`).
 * `allowLeave` lets a deliberate move (to a diagram just saved as new) pass.
 */
export function useUnsavedGuard(dirty: boolean) {
  const allowed = useRef(false);
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => {
      if (allowed.current) return;
      e.preventDefault();
      e.returnValue = "";
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => dirty && !allowed.current && currentLocation.pathname !== nextLocation.pathname,
  );
  const allowLeave = useCallback(() => {
    allowed.current = true;
  }, []);
  return { blocker, allowLeave };
}
