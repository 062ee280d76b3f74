/** The team's custom small bodies, as the computation core wants them. */
import "@/lib/db/sequelize"; // initialises the models in this bundle (see lib/db/sequelize.ts)
import { CustomBody } from "@/models";
import type { TeamBody } from "@/lib/tours/evaluate";
import type { BodyId } from "@/lib/astro/types";

export function toTeamBody(b: CustomBody): TeamBody {
  return {
    id: `custom:${b.slug}` as BodyId,
    name: b.name,
    elements: { a: b.aKm, e: b.e, i: b.iRad, raan: b.raanRad, argp: b.argpRad, nu: b.nuRad },
    epoch: b.epochTdbS,
    mu: b.muKm3S2,
    radius: b.radiusKm,
    minFlybyAltitude: b.minAltKm,
  };
}

export async function teamBodies(teamId: number): Promise<TeamBody[]> {
  const rows = await CustomBody.findAll({ where: { teamId }, order: [["name", "ASC"]] });
  return rows.map(toTeamBody);
}
