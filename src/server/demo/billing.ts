import "server-only";
import { newId } from "@/server/db/ids";
import type { Actor } from "@/shared/auth/policy";
import { addPriceItem, addTaxRate, updateBillingSettings } from "@/server/billing/settings";
import type { DemoContext } from "./seed";

// The demo shop's price list: every price and the tax rate are INVENTED demo data, not advice.
export async function seedDemoBilling(context: DemoContext): Promise<void> {
  const { shopId, userIdsByRole } = context;
  if (!shopId || !userIdsByRole.owner) throw new Error("seedDemoBilling needs the demo shop and its owner.");
  const owner: Actor = { userId: userIdsByRole.owner, shopId, role: "owner" };
  await updateBillingSettings({ actor: owner, input: { currency: "EUR", paymentTermsDays: 14, paymentTermsNote: "Demo terms: 14 days net (invented).", invoicePrefix: "DEMO-", cylinderSetUpMin: 5, stoneChangeMin: 2, jobSetUpMin: 15 } });
  const rate = newId();
  await addTaxRate({ actor: owner, input: { id: rate, name: "Standard (demo)", rate: "20" } });
  const items: [string, string, string][] = [
    ["boring", "Boring, per cylinder (demo price)", "38.00"],
    ["honing", "Honing, per cylinder (demo price)", "42.50"],
    ["plateau", "Plateau finish, per cylinder (demo price)", "18.00"],
    ["torque_plate", "Torque-plate set-up (demo price)", "55.00"],
    ["machine_hour", "Machine time, per hour (demo price)", "64.00"],
    ["labour_hour", "Labour, per hour (demo price)", "48.00"],
  ];
  for (const [kind, name, unitPrice] of items) await addPriceItem({ actor: owner, input: { id: newId(), kind, name, unitPrice, taxRateId: rate } });
}
