"use client";
/**
 * The frequency range a remark is anchored to, read from the bench's address (`?from=20&to=200`, hertz), so the
 * anchor strip and the magnitude plot's x axis show the same band.
 */
import { useSearchParams } from "next/navigation";
import { useMemo } from "react";

export interface AnchorRange {
  fromHz: number;
  toHz: number;
}

export function anchorRange(params: { get(name: string): string | null }): AnchorRange | null {
  const from = params.get("from");
  const to = params.get("to");
  if (from === null || to === null) return null;
  const fromHz = Number(from);
  const toHz = Number(to);
  return Number.isFinite(fromHz) && Number.isFinite(toHz) && fromHz > 0 && toHz > fromHz ? { fromHz, toHz } : null;
}

export function useAnchorRange(): AnchorRange | null {
  const params = useSearchParams();
  const from = params.get("from");
  const to = params.get("to");
  // biome-ignore lint/correctness/useExhaustiveDependencies: the range changes only when its two numbers do
  return useMemo(() => anchorRange(params), [from, to]);
}
