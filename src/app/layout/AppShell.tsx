import { useMatch } from "react-router-dom";
import { Header } from "@/app/layout/Header";
import { shellFrame, ShellBody } from "@/app/layout/ShellBody";
import { paths } from "@shared/routes";

export function AppShell() {
  // The editor and the comparison need the whole width for their canvases; reading pages keep a comfortable measure.
  // The editor also fills the window's height, so its canvas, results and analysis show without page scroll.
  const editor = useMatch(paths.diagram) !== null;
  const compare = useMatch(paths.compare) !== null;
  const wide = editor || compare;
  return (
    <div className={shellFrame(editor)}>
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded focus:bg-paper-raised focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <Header />
      <ShellBody wide={wide} fill={editor} />
    </div>
  );
}
