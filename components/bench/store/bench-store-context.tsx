"use client";
/**
 * One bench store per mounted bench, reached through React context: `useBench(selector)` in any bench component.
 */
import { createContext, type ReactNode, useContext, useState } from "react";
import { useStore } from "zustand";
import type { BenchDocument } from "../document/document";
import { type BenchState, type BenchStore, createBenchStore } from "./bench-store";

const BenchStoreContext = createContext<BenchStore | null>(null);

export function BenchStoreProvider({
  document,
  readOnly,
  children,
}: {
  document: BenchDocument;
  readOnly?: boolean;
  children: ReactNode;
}) {
  // created once per mount; a new revision is loaded through loadDocument
  const [store] = useState(() => createBenchStore(document, { readOnly }));
  return <BenchStoreContext.Provider value={store}>{children}</BenchStoreContext.Provider>;
}

export function useBenchStore(): BenchStore {
  const store = useContext(BenchStoreContext);
  if (!store) throw new Error("useBench must be used inside <BenchStoreProvider>.");
  return store;
}

export function useBench<T>(selector: (state: BenchState) => T): T {
  return useStore(useBenchStore(), selector);
}
