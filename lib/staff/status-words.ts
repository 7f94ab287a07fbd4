export type ModelStatus = "draft" | "published" | "retired";
export const MODEL_STATUSES: readonly ModelStatus[] = ["draft", "published", "retired"];

// Our own words for a model's place in its life.
export const MODEL_STATUS_WORDS: Record<ModelStatus, string> = {
  draft: "Draft",
  published: "On sale",
  retired: "Retired",
};

export const MODEL_STATUS_TONES: Record<ModelStatus, "info" | "good" | "neutral"> = {
  draft: "info",
  published: "good",
  retired: "neutral",
};
