import "server-only";
import { newId } from "@/server/db/ids";
import type { OutboxAttachment } from "@/server/db/schema";
import { removeStored, writeStored } from "@/server/uploads/storage";
import { sendAfterCommit } from "./outbox";

// The one way a document goes out by mail: the PDF is rendered and stored (uploads storage, read by the
// outbox at send time) before any transaction, so a retried transaction never renders or writes files;
// `queue` writes its rows and the outbox row in one transaction and answers with the outbox id; the mail
// goes after commit. If anything fails the stored file is removed: no PDF is kept without its mail.

export type StoredPdf = { attachment: OutboxAttachment; byteLength: number };

export async function mailWithPdf<T>(
  { shopId, filename, render }: { shopId: string; filename: string; render: () => Promise<Buffer> },
  queue: (pdf: StoredPdf) => Promise<{ outboxId: string; value: T }>,
): Promise<T> {
  const bytes = await render();
  const storedName = `${newId()}.pdf`; // stored names are ids (uploads storage), one file per sent copy
  let queued: { outboxId: string; value: T };
  try {
    await writeStored(shopId, storedName, bytes);
    queued = await queue({ attachment: { filename, contentType: "application/pdf", shopId, storedName }, byteLength: bytes.byteLength });
  } catch (error) {
    await removeStored(shopId, storedName).catch(() => undefined);
    throw error;
  }
  sendAfterCommit([queued.outboxId]);
  return queued.value;
}
