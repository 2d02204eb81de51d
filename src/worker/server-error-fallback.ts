/**
 * A floor page the server answers with a 5xx (the database is down: the proxy's plain 503 page) is
 * worse at the machine than the copy the tablet already has: the cards still read, and entries wait
 * in the device queue either way. So a 5xx answer gives way to the cached page when there is one.
 */
export async function preferCachedOnServerError(response: Response, cached: () => Promise<Response | undefined>): Promise<Response> {
  if (response.status < 500) return response;
  return (await cached()) ?? response;
}
