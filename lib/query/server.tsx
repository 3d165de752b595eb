import "server-only";
import { dehydrate, HydrationBoundary, type QueryKey } from "@tanstack/react-query";
import { cache, type ReactNode } from "react";
import { makeQueryClient } from "./client";

/** One QueryClient per server request (React's cache), shared by the page and its server components. */
export const getQueryClient = cache(makeQueryClient);

/**
 * Reads on the server for the first paint: each value goes into the request's query client under the
 * same key the browser's hooks use, and <Hydrate> hands them over, so the browser starts with them.
 */
export async function prefetch<T>(queryKey: QueryKey, read: () => Promise<T>): Promise<T> {
  return getQueryClient().fetchQuery({ queryKey, queryFn: read });
}

export function Hydrate({ children }: { children: ReactNode }) {
  return <HydrationBoundary state={dehydrate(getQueryClient())}>{children}</HydrationBoundary>;
}
