"use client";
import { QueryClientProvider } from "@tanstack/react-query";
import type { ReactNode } from "react";
import { getBrowserQueryClient } from "@/lib/query/client";

export function Providers({ children }: { children: ReactNode }) {
  const client = getBrowserQueryClient();
  return (
    // No next-auth SessionProvider: nothing reads the session in the browser (pages get the user from
    // the server, signOut fetches its own token), and the provider asked /api/auth/session on every load.
    <QueryClientProvider client={client}>{children}</QueryClientProvider>
  );
}
