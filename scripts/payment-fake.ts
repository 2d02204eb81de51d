// A local fake of the payment provider for development and tests (README: Payments). It implements
// only what Borewise calls — create and retrieve a Checkout Session — serves a pay page, and on "Pay"
// posts a checkout.session.completed event signed as the provider signs: HMAC-SHA256 over
// `${timestamp}.${payload}` with the webhook secret, in `Stripe-Signature: t=<unix>,v1=<hex>`.
// Bound to 127.0.0.1 only; it keeps sessions in memory and knows nothing of Borewise's data.
import { createHmac, randomBytes } from "node:crypto";
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import { fileURLToPath } from "node:url";

export type FakeSession = {
  id: string;
  object: "checkout.session";
  status: "open" | "complete";
  payment_status: "unpaid" | "paid";
  amount_total: number;
  currency: string;
  url: string;
  success_url: string | null;
  cancel_url: string | null;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  payment_intent: string | null;
  mode: string;
};

export type FakeOptions = {
  port: number;
  webhookUrl: string;
  webhookSecret: string;
  secretKey?: string;
  /** Tests hand the signed event straight to the route handler instead of over HTTP. */
  deliver?: (payload: string, signature: string) => Promise<number>;
};
export type PaymentFake = { server: Server; port: number; sessions: Map<string, FakeSession>; pay: (id: string) => Promise<number>; close: () => Promise<void> };

const randomId = (prefix: string) => `${prefix}_${randomBytes(12).toString("hex")}`;

export function signPayload(payload: string, secret: string, timestamp = Math.floor(Date.now() / 1000)): string {
  const v1 = createHmac("sha256", secret).update(`${timestamp}.${payload}`, "utf8").digest("hex");
  return `t=${timestamp},v1=${v1}`;
}

async function readBody(req: IncomingMessage): Promise<string> {
  let body = "";
  for await (const chunk of req) {
    body += chunk;
    if (body.length > 64 * 1024) throw new Error("body too large");
  }
  return body;
}

function json(res: ServerResponse, status: number, body: unknown) {
  res.writeHead(status, { "content-type": "application/json" });
  res.end(JSON.stringify(body));
}

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

function payPage(session: FakeSession): string {
  const amount = (session.amount_total / 100).toFixed(2);
  const paid = session.payment_status === "paid";
  return `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>Test payment</title>
<style>body{font:16px system-ui,sans-serif;max-width:28rem;margin:3rem auto;padding:0 1rem}button{min-height:48px;width:100%;font-size:1.1rem}</style></head>
<body><p><strong>Test payment service</strong> (local fake: no card is charged)</p>
<p>Amount: <span data-testid="fake-amount">${amount} ${escapeHtml(session.currency.toUpperCase())}</span></p>
${paid ? `<p data-testid="fake-paid">Paid.</p>` : `<form method="post"><button type="submit" data-testid="fake-pay">Pay ${amount} ${escapeHtml(session.currency.toUpperCase())}</button></form>`}
</body></html>`;
}

export async function startPaymentFake(options: FakeOptions): Promise<PaymentFake> {
  const sessions = new Map<string, FakeSession>();
  const base = () => `http://127.0.0.1:${(server.address() as { port: number }).port}`;

  async function sendCompleted(session: FakeSession): Promise<number> {
    const event = { id: randomId("evt"), object: "event", api_version: "2026-01-01", created: Math.floor(Date.now() / 1000), type: "checkout.session.completed", data: { object: session }, livemode: false, pending_webhooks: 1 };
    const payload = JSON.stringify(event);
    if (options.deliver) return options.deliver(payload, signPayload(payload, options.webhookSecret));
    const response = await fetch(options.webhookUrl, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": signPayload(payload, options.webhookSecret) }, body: payload });
    return response.status;
  }

  async function pay(id: string): Promise<number> {
    const session = sessions.get(id);
    if (!session) throw new Error(`no session ${id}`);
    session.status = "complete";
    session.payment_status = "paid";
    session.payment_intent ??= randomId("pi");
    return sendCompleted(session);
  }

  const server = createServer((req, res) => {
    void (async () => {
      const url = new URL(req.url ?? "/", "http://127.0.0.1");
      if (req.method === "GET" && url.pathname === "/health") return json(res, 200, { ok: true });
      if (url.pathname.startsWith("/v1/") && options.secretKey && req.headers.authorization !== `Bearer ${options.secretKey}`) {
        return json(res, 401, { error: { type: "invalid_request_error", message: "Invalid API key provided." } });
      }
      if (req.method === "POST" && url.pathname === "/v1/checkout/sessions") {
        const form = new URLSearchParams(await readBody(req));
        const unit = Number(form.get("line_items[0][price_data][unit_amount]"));
        const quantity = Number(form.get("line_items[0][quantity]") ?? 1);
        if (!Number.isSafeInteger(unit) || unit <= 0) return json(res, 400, { error: { type: "invalid_request_error", message: "unit_amount is required" } });
        const metadata: Record<string, string> = {};
        for (const [key, value] of form) {
          const m = /^metadata\[(.+)\]$/.exec(key);
          if (m) metadata[m[1]!] = value;
        }
        const id = randomId("cs_test");
        const session: FakeSession = {
          id, object: "checkout.session", status: "open", payment_status: "unpaid", amount_total: unit * quantity,
          currency: form.get("line_items[0][price_data][currency]") ?? "eur", url: `${base()}/pay/${id}`, success_url: form.get("success_url"),
          cancel_url: form.get("cancel_url"), client_reference_id: form.get("client_reference_id"), customer_email: form.get("customer_email"),
          metadata, payment_intent: null, mode: form.get("mode") ?? "payment",
        };
        sessions.set(id, session);
        return json(res, 200, session);
      }
      const retrieve = /^\/v1\/checkout\/sessions\/([\w-]+)$/.exec(url.pathname);
      if (req.method === "GET" && retrieve) {
        const session = sessions.get(retrieve[1]!);
        return session ? json(res, 200, session) : json(res, 404, { error: { type: "invalid_request_error", message: "No such checkout session" } });
      }
      const page = /^\/pay\/([\w-]+)$/.exec(url.pathname);
      const session = page ? sessions.get(page[1]!) : undefined;
      if (page && !session) return json(res, 404, { error: "not found" });
      if (page && session && req.method === "GET") {
        res.writeHead(200, { "content-type": "text/html; charset=utf-8" });
        return res.end(payPage(session));
      }
      if (page && session && req.method === "POST") {
        if (session.payment_status !== "paid") await pay(session.id);
        res.writeHead(303, { location: session.success_url ?? `/pay/${session.id}` });
        return res.end();
      }
      json(res, 404, { error: "not found" });
    })().catch((error) => json(res, 500, { error: String(error) }));
  });
  await new Promise<void>((resolve) => server.listen(options.port, "127.0.0.1", resolve));
  const port = (server.address() as { port: number }).port;
  return { server, port, sessions, pay, close: () => new Promise((resolve) => server.close(() => resolve())) };
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const port = Number(process.env.PAYMENT_FAKE_PORT ?? 12111);
  const appUrl = process.env.APP_URL ?? "http://127.0.0.1:3000";
  const fake = await startPaymentFake({
    port,
    webhookUrl: process.env.PAYMENT_FAKE_WEBHOOK_URL ?? `${appUrl}/api/payments/webhook`,
    webhookSecret: process.env.STRIPE_WEBHOOK_SECRET ?? "whsec_borewise_fake",
    secretKey: process.env.STRIPE_SECRET_KEY ?? "sk_test_borewise_fake",
  });
  console.log(`payment fake on http://127.0.0.1:${fake.port}, webhooks to ${process.env.PAYMENT_FAKE_WEBHOOK_URL ?? `${appUrl}/api/payments/webhook`}`);
}
