"use server";
import { defineAction } from "@/server/http/action";
import { revokeRecordLink } from "@/server/records/links";
import { sendRecord } from "@/server/records/send";
import { revokeRecordLinkSchema, sendRecordSchema } from "@/shared/records/schema";

// The machining record's mutations (issue 14): send it (machinist or above), revoke a customer link.
export const sendRecordAction = defineAction(sendRecordSchema, "records.send", async (actor, input) => sendRecord({ actor, input }));
export const revokeRecordLinkAction = defineAction(revokeRecordLinkSchema, "records.send", async (actor, input) => revokeRecordLink({ actor, input }));
