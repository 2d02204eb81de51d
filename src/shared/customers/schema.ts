// Shared by the customer form and the server.
import { z } from "zod";
import { UNIT_SYSTEMS } from "@/shared/units";

const optionalText = (max: number, label: string) =>
  z
    .string()
    .trim()
    .max(max, `${label} is at most ${max} characters.`)
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional();

export const customerSchema = z.object({
  name: z.string().trim().min(1, "Enter the customer's name.").max(120, "Names are at most 120 characters."),
  email: z
    .string()
    .trim()
    .max(254)
    .refine((v) => v === "" || z.email().safeParse(v).success, "That is not an e-mail address.")
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional(),
  phone: z
    .string()
    .trim()
    .max(40, "Phone numbers are at most 40 characters.")
    .regex(/^[0-9+()\-. ]*$/, "Use digits, spaces and + ( ) - . in phone numbers.")
    .transform((v) => (v === "" ? null : v))
    .nullable()
    .optional(),
  notes: optionalText(2000, "Notes"),
  /** The unit of their machining record: "" (or absent) leaves it to whoever sends it. */
  unitSystem: z.union([z.enum(UNIT_SYSTEMS, { error: "Choose mm or inch." }), z.literal("").transform(() => null)]).nullable().optional(),
});
export type CustomerInput = z.infer<typeof customerSchema>;

export const CUSTOMER_SORTS = ["name", "createdAt", "jobCount"] as const;

export const customerListSchema = z.object({
  q: z.string().trim().max(100).optional().default(""),
  sort: z.enum(CUSTOMER_SORTS).optional().default("name"),
  dir: z.enum(["asc", "desc"]).optional().default("asc"),
  page: z.coerce.number().int().min(1).max(10_000).optional().default(1),
  pageSize: z.coerce.number().int().min(5).max(100).optional().default(20),
  archived: z.enum(["only", "include", "exclude"]).optional().default("exclude"),
});
export type CustomerListQuery = z.infer<typeof customerListSchema>;
