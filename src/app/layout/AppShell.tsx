import { Suspense } from "react";
import { Outlet, useMatch } from "react-router-dom";
import { Header } from "@/app/layout/Header";
import { Loading } from "@/components/QueryState";
import { SafetyNote } from "@/components/SafetyNote";
import { paths } from "@shared/routes";

export function AppShell() {
  // The editor needs the whole width for its canvas; reading pages keep a comfortable measure.
  const wide = useMatch(paths.diagram) !== null;
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded focus:bg-paper-raised focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <Header />
      <main id="main" tabIndex={-1} className={`mx-auto w-full flex-1 px-4 sm:px-6 ${wide ? "max-w-none py-4" : "max-w-6xl py-8"}`}>
        <Suspense fallback={<Loading label="Loading the page…" />}>
          <Outlet />
        </Suspense>
      </main>
      <footer className="border-t border-rule bg-paper-sunk">
        <div className="mx-auto max-w-6xl px-4 py-4 sm:px-6">
          <SafetyNote />
        </div>
      </footer>
    </div>
  );
}
