import { StrictMode } from "react";
import { createRoot } from "react-dom/client";
import "@fontsource/ibm-plex-sans/400.css";
import "@fontsource/ibm-plex-sans/500.css";
import "@fontsource/ibm-plex-sans/600.css";
import "@fontsource/ibm-plex-mono/400.css";
import "@/index.css";
import { App } from "@/app/App";
import { preloadDiagramPage } from "@/app/preloadDiagramPage";
import { makeQueryClient } from "@/app/queryClient";

/** Longest the first render waits for a diagram page's preloads; past it the page renders its loading states. */
const PRELOAD_WAIT_MS = 3000;

const queryClient = makeQueryClient();
const render = () =>
  createRoot(document.getElementById("root")!).render(
    <StrictMode>
      <App queryClient={queryClient} />
    </StrictMode>,
  );

// A diagram's link renders once, with its session, data and code at hand, instead of passing through
// "checking your session" and "loading" screens that each cost a render and a layout of their own.
const preloads = preloadDiagramPage(queryClient, window.location.pathname);
if (preloads) void Promise.race([preloads, new Promise((r) => setTimeout(r, PRELOAD_WAIT_MS))]).then(render);
else render();
