import { applyPaymentWebhook } from "@/server/billing/payments";
import { toPublicError } from "@/server/http/errors";

export const dynamic = "force-dynamic";

const MAX_BODY_BYTES = 256 * 1024;

/** The payment provider's webhook: no session and no Origin (it is not a browser); the signature is the check. */
export async function POST(request: Request): Promise<Response> {
  try {
    const length = Number(request.headers.get("content-length") ?? 0);
    if (length > MAX_BODY_BYTES) return Response.json({ error: "Too large." }, { status: 413 });
    const body = await request.text();
    if (Buffer.byteLength(body) > MAX_BODY_BYTES) return Response.json({ error: "Too large." }, { status: 413 });
    const outcome = await applyPaymentWebhook(body, request.headers.get("stripe-signature"));
    return Response.json({ received: true, outcome });
  } catch (error) {
    const { status, body } = toPublicError(error);
    return Response.json(body, { status });
  }
}
