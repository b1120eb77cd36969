import { mesh } from "topojson-client";
import type { GeometryCollection, Topology } from "topojson-specification";
// Served as static files and fetched only when a map opens; the JSON stays out of the app's code.
import countriesUrl from "world-atlas/countries-50m.json?url";
import statesUrl from "us-atlas/states-10m.json?url";
import type { LonLat } from "./project-outlines.ts";

/**
 * Coastlines, country borders and US state borders as lines of [longitude, latitude] vertices.
 * Sources: Natural Earth 1:50m countries (world-atlas) and US Census 1:10m states (us-atlas).
 */
export interface OutlineLines {
  coastlines: LonLat[][];
  countryBorders: LonLat[][];
  stateBorders: LonLat[][];
}

function isTopology(value: unknown, objectName: string): value is Topology<Record<string, GeometryCollection>> {
  if (typeof value !== "object" || value === null) return false;
  const candidate = value as { type?: unknown; objects?: Record<string, unknown>; arcs?: unknown };
  return candidate.type === "Topology" && Array.isArray(candidate.arcs) && typeof candidate.objects?.[objectName] === "object";
}

async function fetchTopology(url: string, objectName: string): Promise<Topology<Record<string, GeometryCollection>>> {
  const response = await fetch(url);
  if (!response.ok) throw new Error(`The map outlines (${objectName}) could not be loaded: the server answered ${response.status}`);
  const body: unknown = await response.json();
  if (!isTopology(body, objectName)) throw new Error(`The map outlines file has no "${objectName}" layer`);
  return body;
}

/**
 * A shared arc between two shapes is a border; an arc used by one shape only is its outer edge,
 * which for countries is the coast.
 */
export async function loadOutlineLines(): Promise<OutlineLines> {
  const [world, us] = await Promise.all([fetchTopology(countriesUrl, "countries"), fetchTopology(statesUrl, "states")]);
  const countries = world.objects.countries!;
  const states = us.objects.states!;
  return {
    coastlines: mesh(world, countries, (a, b) => a === b).coordinates,
    countryBorders: mesh(world, countries, (a, b) => a !== b).coordinates,
    stateBorders: mesh(us, states, (a, b) => a !== b).coordinates,
  };
}
