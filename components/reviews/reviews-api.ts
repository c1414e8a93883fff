/** The browser's calls of the review routes (app/api/reviews/**, app/api/remarks/**, app/api/designs/[id]/reviews). */
import { apiFetch } from "@/components/api/client";
import type { CreateRemarkInput, CreateReviewInput, DecisionInput } from "@/components/schemas/review";

export const requestReview = (designId: string, input: CreateReviewInput) =>
  apiFetch<{ review: { id: string }; path: string }>(`/api/designs/${designId}/reviews`, { method: "POST", body: input });

export const postRemark = (reviewId: string, input: CreateRemarkInput) =>
  apiFetch<{ remark: { id: string } }>(`/api/reviews/${reviewId}/remarks`, { method: "POST", body: input });

export const setResolved = (remarkId: string, resolved: boolean) =>
  apiFetch<{ resolved: boolean }>(`/api/remarks/${remarkId}`, { method: "PATCH", body: { resolved } });

export const postDecision = (reviewId: string, input: DecisionInput) =>
  apiFetch<{ reviewStatus: string }>(`/api/reviews/${reviewId}/decisions`, { method: "POST", body: input });
