import { Suspense } from "react";
import { Outlet } from "react-router-dom";
import { Loading } from "@/components/QueryState";
import { SafetyNote } from "@/components/SafetyNote";

/** The page under a shell's header: the routed page (full width when `wide`) and the safety caution below it; printed, the page alone. */
export function ShellBody({ wide }: { wide: boolean }) {
  return (
    <>
      <main id="main" tabIndex={-1} className={`mx-auto w-full flex-1 px-4 sm:px-6 ${wide ? "max-w-none py-4" : "max-w-6xl py-8"} print:max-w-none print:p-0`}>
        <Suspense fallback={<Loading label="Loading the page…" />}>
          <Outlet />
        </Suspense>
      </main>
      <footer className="border-t border-rule bg-paper-sunk print:hidden">
        <div className="mx-auto max-w-6xl px-4 py-4 sm:px-6">
          <SafetyNote />
        </div>
      </footer>
    </>
  );
}
