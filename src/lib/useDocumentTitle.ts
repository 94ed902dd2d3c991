import { useEffect } from "react";

/** Names the browser tab and history entry after the page: "<title> · Loopwright". */
export function useDocumentTitle(title: string) {
  useEffect(() => {
    document.title = `${title} · Loopwright`;
  }, [title]);
}
