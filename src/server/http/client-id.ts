import "server-only";
import { AppError } from "@/server/errors";
import { CLIENT_ID_PATTERN } from "@/shared/client-id";
import { newId } from "@/server/db/ids";

/** The id the device made for what it creates (so a retry is answered once), or a new one when it sent none. */
export function clientIdOrNew(clientId: unknown): string {
  if (clientId === undefined || clientId === null || clientId === "") return newId();
  if (typeof clientId !== "string" || !CLIENT_ID_PATTERN.test(clientId)) {
    throw new AppError("bad_request", "The request id is not valid. Reload the page and try again.", { fieldErrors: { clientId: ["Not a valid id."] } });
  }
  return clientId;
}
