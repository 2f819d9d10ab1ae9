import { useMutation } from "@tanstack/react-query";
import { ApiError, apiErrorOf } from "@/lib/query/api-fetch";

export type TUploadResult = { id: string; originalName: string; sizeBytes: number; sha256: string };

/**
 * Sends the file as the raw request body (the server streams it to storage). XMLHttpRequest,
 * because fetch reports no upload progress.
 */
export function uploadFile(
  file: File,
  onProgress: (share: number) => void,
): Promise<TUploadResult> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", "/api/v1/uploads");
    xhr.setRequestHeader("content-type", "text/csv");
    xhr.setRequestHeader("x-file-name", encodeURIComponent(file.name));
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable) onProgress(e.loaded / e.total);
    };
    xhr.onload = () => {
      let data: unknown = null;
      try {
        data = JSON.parse(xhr.responseText);
      } catch {
        data = null;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        onProgress(1);
        resolve(data as TUploadResult);
      } else reject(apiErrorOf(xhr.status, data));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(
          0,
          "network",
          "The upload was interrupted. Check the connection and try again.",
        ),
      );
    xhr.send(file);
  });
}

export function useUploadFile(onProgress: (share: number) => void) {
  return useMutation({ mutationFn: (file: File) => uploadFile(file, onProgress) });
}
