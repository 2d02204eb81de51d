/** A byte limit as people read it ("15 MB", "512 KB"); the server's refusal and the device's check say the same. */
export function describeBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.floor(bytes / (1024 * 1024))} MB` : `${Math.floor(bytes / 1024)} KB`;
}
