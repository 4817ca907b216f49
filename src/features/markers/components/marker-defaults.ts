/**
 * The fabric a new marker starts on: the fabric of the batch's cut plan, whose lays the marker is built for,
 * else the first fabric. The alphabetical first is often the lining, a narrower cloth than the lays are planned on.
 */
export function markerFabricId(planFabricId: number | undefined, fabricIds: readonly number[]): number | undefined {
  return planFabricId !== undefined && fabricIds.includes(planFabricId) ? planFabricId : fabricIds[0];
}
