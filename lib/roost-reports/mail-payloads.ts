import { z } from "zod";

// What the roost-report messages carry in the outbox: the order, the season, and the houses
// (order line and unit) the message is about, as of queueing. The sender loads the rest.

const house = z.object({ orderLineId: z.uuid(), unit: z.number().int().min(1).max(10) });

export const roostAskPayloadSchema = z.object({
  orderId: z.uuid(),
  season: z.number().int().min(2000).max(9999),
  houses: z.array(house).min(1).max(100),
});
export const roostAdvicePayloadSchema = roostAskPayloadSchema;
export type RoostAskPayload = z.infer<typeof roostAskPayloadSchema>;
