"use server";
import { z } from "zod";
import { defineAction } from "@/server/http/action";
import { releasePlan, savePlanDraft, saveQuickPlan, withdrawPlan } from "@/server/plans/mutations";
import { id } from "@/shared/fields";

// The plan screens' mutations (one mutation path: DEVELOPERS.md). The wizard calls them with the
// object it validated with the shared schema (and the device's ids); the server function parses it
// again with that schema and recomputes every number.

const withInput = z.object({ input: z.unknown() });
const onPlan = z.object({ planId: id });

export const savePlanDraftAction = defineAction(withInput, "plans.create", async (actor, { input }) => savePlanDraft({ actor, input }));
export const saveQuickPlanAction = defineAction(withInput, "plans.create", async (actor, { input }) => saveQuickPlan({ actor, input }));
export const releasePlanAction = defineAction(onPlan, "plans.release", async (actor, { planId }) => releasePlan({ actor, planId }));
export const withdrawPlanAction = defineAction(onPlan.extend({ input: z.unknown() }), "plans.withdraw", async (actor, { planId, input }) => withdrawPlan({ actor, planId, input }));
