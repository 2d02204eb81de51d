// Inputs of the machining record (issue 14), shared by the forms and the server.
import { z } from "zod";
import { id } from "@/shared/fields";
import { UNIT_SYSTEMS } from "@/shared/units";

const email = z.string().trim().max(254, "At most 254 characters.").pipe(z.email("That is not an e-mail address."));

export const sendRecordSchema = z.object({
  jobId: id,
  to: email,
  unitSystem: z.enum(UNIT_SYSTEMS, { error: "Choose mm or inch." }),
  clientId: z.string().max(36).optional(),
});
export type SendRecordInput = z.infer<typeof sendRecordSchema>;

export const revokeRecordLinkSchema = z.object({ jobId: id, linkId: id });

export const recordSettingsSchema = z.object({
  address: z.string().trim().max(400, "At most 400 characters."),
  contact: z.string().trim().max(200, "At most 200 characters."),
  remarks: z.string().trim().min(1, "Write the remarks every record carries.").max(2000, "At most 2000 characters."),
});
