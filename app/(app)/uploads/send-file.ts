// Send one file as the raw request body. XMLHttpRequest rather than fetch
// because only it reports upload progress in every browser; either way the
// browser streams the File from disk and the server streams it on.
import type { UploadJson } from "@/components/upload-types";

export interface SendHandle {
  done: Promise<UploadJson>;
  abort: () => void;
}

export function sendFile(file: File, onProgress: (loaded: number, total: number) => void): SendHandle {
  const xhr = new XMLHttpRequest();
  const done = new Promise<UploadJson>((resolve, reject) => {
    xhr.open("POST", "/api/uploads");
    xhr.setRequestHeader("x-file-name", encodeURIComponent(file.name));
    xhr.setRequestHeader("Content-Type", file.type || "text/csv");
    xhr.responseType = "json";
    xhr.upload.onprogress = (e) => onProgress(e.loaded, e.lengthComputable ? e.total : file.size);
    xhr.onload = () => {
      const body: unknown = xhr.response;
      if (xhr.status >= 200 && xhr.status < 300 && body) resolve(body as UploadJson);
      else reject(new Error(readErrorMessage(body, xhr.status)));
    };
    xhr.onerror = () => reject(new Error("The connection dropped while sending the file. Try again."));
    xhr.onabort = () => reject(new Error("Sending was cancelled."));
    xhr.send(file);
  });
  return { done, abort: () => xhr.abort() };
}

function readErrorMessage(body: unknown, status: number): string {
  const err = (body as { error?: { message?: unknown } } | null)?.error;
  if (err && typeof err.message === "string") return err.message;
  if (status === 401) return "Your session has ended; sign in again.";
  if (status === 413) return "The file is larger than this server accepts.";
  return `The server did not accept the file (HTTP ${status}).`;
}
