"use client";

import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { useState, type ComponentType, type ReactNode } from "react";

// TanStack Query for the components that fetch from the client (the catalog's filters, the cart's
// quote, the placement check, the workshop's and the shipping desk's tables). Each wraps itself in
// this rather than the whole store in one provider, so pages that fetch nothing carry none of its
// script. In the browser they share one client (one cache across the page); on the server each
// render gets its own.
const options = { defaultOptions: { queries: { staleTime: 30_000, refetchOnWindowFocus: false } } };
let browserClient: QueryClient | undefined;

function queryClient(): QueryClient {
  if (typeof window === "undefined") return new QueryClient(options);
  return (browserClient ??= new QueryClient(options));
}

export function WithQueries({ children }: { children: ReactNode }) {
  const [client] = useState(queryClient);
  return <QueryClientProvider client={client}>{children}</QueryClientProvider>;
}

/** The component, wrapped in WithQueries: `export const CatalogBrowser = withQueries(CatalogBrowserWithData)`. */
export function withQueries<P extends object>(Component: ComponentType<P>) {
  function Wrapped(props: P) {
    return (
      <WithQueries>
        <Component {...props} />
      </WithQueries>
    );
  }
  Wrapped.displayName = `withQueries(${Component.displayName ?? Component.name})`;
  return Wrapped;
}
