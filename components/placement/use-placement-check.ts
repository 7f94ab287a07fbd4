"use client";

import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useCallback, useEffect, useState } from "react";
import type { PlacementAnswer } from "@/lib/placement/placement-answer";
import type { PlacementInput } from "@/lib/placement/schema";
import { requestPlacementCheck, type ApiError } from "./placement-api";

/** Long enough that typing "15" sends one check, short enough to feel live. Common practice. */
const DEBOUNCE_MS = 450;

/**
 * Checks the site as the buyer edits it: once the inputs are valid, a check runs after a short
 * pause (the previous answer stays on screen meanwhile); `checkNow` skips the pause.
 */
export function usePlacementCheck(input: PlacementInput | null) {
  const key = input ? JSON.stringify(input) : null;
  const [settled, setSettled] = useState<string | null>(key);

  useEffect(() => {
    const timer = setTimeout(() => setSettled(key), DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [key]);

  const query = useQuery<PlacementAnswer, ApiError>({
    queryKey: ["placement", settled],
    queryFn: ({ signal }) =>
      requestPlacementCheck(JSON.parse(settled ?? "null") as PlacementInput, signal),
    enabled: settled !== null,
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: 5 * 60_000,
  });

  const checkNow = useCallback(() => setSettled(key), [key]);
  // Waiting out the pause counts as busy too, so the indicator shows from the first keystroke.
  const busy = (key !== null && key !== settled) || query.isFetching;
  // The answer on screen is for the inputs as they are only when nothing is pending.
  const current = !busy && query.isSuccess && !query.isPlaceholderData && settled === key;
  return { query, busy, current, checkNow, settledInput: settled };
}
