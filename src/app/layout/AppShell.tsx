import { Suspense } from "react";
import { Outlet } from "react-router-dom";
import { Header } from "@/app/layout/Header";
import { Loading } from "@/components/QueryState";
import { SafetyNote } from "@/components/SafetyNote";

export function AppShell() {
  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50 focus:rounded focus:bg-paper-raised focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <Header />
      <main id="main" tabIndex={-1} className="mx-auto w-full max-w-6xl flex-1 px-4 py-8 sm:px-6">
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
