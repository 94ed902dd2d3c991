import { useSyncExternalStore } from "react";

/** Tailwind's `lg` breakpoint: from here the editor fits the window; below it the page stacks and scrolls. */
const WIDE = "(min-width: 1024px)";

const subscribe = (onChange: () => void) => {
  const query = window.matchMedia(WIDE);
  query.addEventListener("change", onChange);
  return () => query.removeEventListener("change", onChange);
};
const wideNow = () => window.matchMedia(WIDE).matches;

/** Whether the editor is laid out to fit the window (canvas beside its columns, no page scroll). */
export function useWideLayout(): boolean {
  return useSyncExternalStore(subscribe, wideNow, () => true);
}
