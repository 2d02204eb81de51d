// The payment fake inside a test file: started on the file's own port (set as PAYMENT_API_BASE in the
// file's vi.hoisted, before env.ts loads), its signed webhooks handed straight to the route handler.
import { afterAll, beforeAll } from "vitest";
import { POST as webhook } from "@/app/api/payments/webhook/route";
import { paymentConfig } from "@/env";
import { startPaymentFake, type PaymentFake } from "../../scripts/payment-fake";

/** Posts a signed event to the webhook route; answers its status. */
export const deliverWebhook = async (payload: string, signature: string) =>
  (await webhook(new Request("http://127.0.0.1/api/payments/webhook", { method: "POST", headers: { "stripe-signature": signature, "content-type": "application/json" }, body: payload }))).status;

/** Runs the fake for the file's tests; its sessions and `pay` are read once it has started. */
export function paymentFakeForFile(port: number): Pick<PaymentFake, "sessions" | "pay"> {
  let fake: PaymentFake | null = null;
  beforeAll(async () => {
    const { webhookSecret, secretKey } = paymentConfig();
    fake = await startPaymentFake({ port, webhookUrl: "unused", webhookSecret, secretKey, deliver: deliverWebhook });
  });
  afterAll(() => fake?.close());
  return { get sessions() { return fake!.sessions; }, pay: (id: string) => fake!.pay(id) };
}
