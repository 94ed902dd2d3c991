import { Suspense } from "react";
import { Outlet } from "react-router-dom";
import { Loading } from "@/components/QueryState";
import { SafetyNote } from "@/components/SafetyNote";

/** Classes for a shell's outer frame: with `fill`, from 1024 px it is exactly the window's height (see ShellBody). */
export const shellFrame = (fill: boolean) => `flex min-h-screen flex-col print:block print:min-h-0 ${fill ? "lg:h-dvh print:h-auto" : ""}`;

/**
 * The page under a shell's header: the routed page (full width when `wide`) and the safety caution below it; printed,
 * the page alone. With `fill` (the editor), from 1024 px the page is a column the height of what the window leaves,
 * so the editor can take the rest of it and scroll its own panes instead of the page.
 */
export function ShellBody({ wide, fill = false }: { wide: boolean; fill?: boolean }) {
  return (
    <>
      <main id="main" tabIndex={-1} className={`mx-auto w-full flex-1 px-4 sm:px-6 ${wide ? "max-w-none py-4" : "max-w-6xl py-8"} ${fill ? "lg:flex lg:min-h-0 lg:flex-col lg:py-3" : ""} print:max-w-none print:p-0`}>
        <Suspense fallback={<Loading label="Loading the page…" />}>
          <Outlet />
        </Suspense>
      </main>
      <footer className="border-t border-rule bg-paper-sunk print:hidden">
        <div className={`mx-auto px-4 sm:px-6 ${fill ? "max-w-none py-4 lg:py-2" : "max-w-6xl py-4"}`}>
          <SafetyNote />
        </div>
      </footer>
    </>
  );
}
