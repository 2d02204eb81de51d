import { describe, expect, it, vi } from "vitest";
import { readdir } from "node:fs/promises";
import path from "node:path";
import { eq } from "drizzle-orm";

vi.mock("@/server/mail/outbox", async (original) => ({ ...(await original<Record<string, unknown>>()), sendAfterCommit: vi.fn() }));

import { env } from "@/env";
import { db } from "@/server/db";
import { inTransaction } from "@/server/db/retry";
import { emailOutbox } from "@/server/db/schema";
import { enqueueMail, sendAfterCommit } from "@/server/mail/outbox";
import { mailWithPdf } from "@/server/mail/pdf-mail";
import { readStored } from "@/server/uploads/storage";
import { createShopWithMembers } from "../support/fixtures";

const filesOf = async (shopId: string) => readdir(path.join(path.resolve(env.UPLOAD_DIR), shopId)).catch(() => [] as string[]);
const pdf = async () => Buffer.from("%PDF-1.4 test bytes");

describe("mailWithPdf (the one path for a mailed PDF)", () => {
  it("stores the PDF, attaches it to the outbox row and sends after commit", async () => {
    const shop = await createShopWithMembers("pdf-mail-ok");
    const to = `pdf-mail-${shop.shopId}@example.test`;
    const answer = await mailWithPdf({ shopId: shop.shopId, filename: "doc.pdf", render: pdf }, async ({ attachment, byteLength }) => ({
      value: byteLength,
      outboxId: await inTransaction((tx) => enqueueMail(tx, { subject: "A document", html: "<p>x</p>", text: "x", to, kind: "test", shopId: shop.shopId, attachments: [attachment] })),
    }));
    expect(answer).toBe((await pdf()).byteLength);
    const [row] = await db.select().from(emailOutbox).where(eq(emailOutbox.toAddress, to));
    const attachment = row!.attachments![0]!;
    expect(attachment).toMatchObject({ filename: "doc.pdf", contentType: "application/pdf", shopId: shop.shopId });
    expect(await readStored(shop.shopId, attachment.storedName)).toEqual(await pdf());
    expect(vi.mocked(sendAfterCommit)).toHaveBeenCalledWith([row!.id]);
  });

  it("removes the stored PDF and sends nothing when the transaction fails", async () => {
    const shop = await createShopWithMembers("pdf-mail-fail");
    const before = await filesOf(shop.shopId);
    vi.mocked(sendAfterCommit).mockClear();
    await expect(mailWithPdf({ shopId: shop.shopId, filename: "doc.pdf", render: pdf }, async () => {
      throw new Error("the transaction failed");
    })).rejects.toThrow("the transaction failed");
    expect(await filesOf(shop.shopId)).toEqual(before);
    expect(vi.mocked(sendAfterCommit)).not.toHaveBeenCalled();
  });
});
