import { useEffect } from "react";
import { useBlocker } from "react-router-dom";

/**
 * Warns before unsaved changes are left behind: the browser's own prompt on reload or close, and a
 * blocker for links inside the app (the caller shows its question while `blocker.state === "blocked"`).
 */
export function useUnsavedGuard(dirty: boolean) {
  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => {
      e.preventDefault();
      e.returnValue = "";
    };
    window.addEventListener("beforeunload", warn);
    return () => window.removeEventListener("beforeunload", warn);
  }, [dirty]);
  return useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
}
