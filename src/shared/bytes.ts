/** A byte limit as people read it ("15 MB", "512 KB"); the server's refusal and the device's check say the same. */
export function describeBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.floor(bytes / (1024 * 1024))} MB` : `${Math.floor(bytes / 1024)} KB`;
}

/** A file's own size as people read it ("840 KB", "3.2 MB"); never "0 KB" for a small file. */
export function fileSizeText(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${(bytes / (1024 * 1024)).toFixed(1)} MB` : `${Math.max(1, Math.round(bytes / 1024))} KB`;
}
