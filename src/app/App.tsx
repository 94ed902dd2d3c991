import { useState } from "react";
import { QueryClientProvider } from "@tanstack/react-query";
import { RouterProvider } from "react-router-dom";
import { Toaster } from "sonner";
import { makeQueryClient } from "@/app/queryClient";
import { preloadDiagramPage } from "@/app/preloadDiagramPage";
import { router } from "@/app/router";

export function App() {
  const [queryClient] = useState(() => {
    const client = makeQueryClient();
    preloadDiagramPage(client, window.location.pathname);
    return client;
  });
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
      <Toaster position="bottom-right" richColors closeButton toastOptions={{ className: "font-sans" }} />
    </QueryClientProvider>
  );
}
