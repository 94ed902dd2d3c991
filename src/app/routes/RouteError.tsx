import { isRouteErrorResponse, useRouteError } from "react-router-dom";
import { SafetyNote } from "@/components/SafetyNote";

/**
 * Last resort when a page throws while rendering, or its code chunk fails to load (often after a
 * new release): explain, and offer a reload.
 */
export function RouteError() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : "Unknown error";
  return (
    <div className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-xl font-semibold">This page stopped working</h1>
      <p role="alert" className="mt-3 text-sm text-ink-soft">
        {detail}
      </p>
      <p className="mt-6">
        <a href={window.location.href} className="text-signal underline underline-offset-2">
          Reload the page
        </a>
      </p>
      <div className="mt-12 border-t border-rule pt-4">
        <SafetyNote />
      </div>
    </div>
  );
}
