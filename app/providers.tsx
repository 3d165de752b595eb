"use client";
import { QueryClientProvider } from "@tanstack/react-query";
import { SessionProvider } from "next-auth/react";
import type { ReactNode } from "react";
import { getBrowserQueryClient } from "@/lib/query/client";

export function Providers({ children }: { children: ReactNode }) {
  const client = getBrowserQueryClient();
  return (
    <SessionProvider>
      <QueryClientProvider client={client}>{children}</QueryClientProvider>
    </SessionProvider>
  );
}
