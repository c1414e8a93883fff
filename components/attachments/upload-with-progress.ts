/**
 * A multipart upload that reports how much has been sent. fetch() cannot tell upload progress, so this is the one
 * place Backplate uses XMLHttpRequest; the server's error shape becomes the same ApiError the rest of the client reads.
 */
import { ApiError } from "@/components/api/client";

export function uploadWithProgress<T>(url: string, form: FormData, onProgress: (fraction: number) => void): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.withCredentials = true;
    xhr.responseType = "text";
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, "network", "Backplate's server cannot be reached. Check the connection and try again."));
    xhr.onload = () => {
      let data: { error?: { code?: string; message?: string; fields?: Record<string, string> } } | null = null;
      try {
        data = JSON.parse(xhr.responseText);
      } catch {
        data = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) return resolve(data as T);
      const error = data?.error;
      reject(
        new ApiError(
          xhr.status,
          error?.code ?? "unavailable",
          error?.message ?? `The server answered ${xhr.status}. Try again in a moment.`,
          error?.fields,
        ),
      );
    };
    xhr.send(form);
  });
}
