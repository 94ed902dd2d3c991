/** Side of a block an input enters. Outputs always leave on the right: signals flow left to right. */
export type Side = "left" | "top" | "bottom";

/** Where an input port of a summing junction sits: a side and a fraction along it (top→bottom, left→right). */
export interface PortPlace {
  side: Side;
  fraction: number;
}

/**
 * Port 0 enters from the left (the reference), port 1 from below (the feedback path), port 2 from above
 * (a disturbance); further ports share the left side. Adding a port never moves an existing one.
 */
export function sumPortPlaces(count: number): readonly PortPlace[] {
  let places = placesByCount.get(count);
  if (!places) placesByCount.set(count, (places = Object.freeze(portPlaces(count))));
  return places;
}

// Every wire into a junction asks for its port's place; a junction's count of ports rarely changes.
const placesByCount = new Map<number, readonly PortPlace[]>();

function portPlaces(count: number): PortPlace[] {
  const leftPorts = [0, ...Array.from({ length: Math.max(0, count - 3) }, (_, i) => i + 3)].filter((p) => p < count);
  return Array.from({ length: count }, (_, port) => {
    if (port === 1) return { side: "bottom", fraction: 0.5 };
    if (port === 2) return { side: "top", fraction: 0.5 };
    const k = leftPorts.indexOf(port);
    return { side: "left", fraction: (k + 1) / (leftPorts.length + 1) };
  });
}

/** Diameter of the junction's circle: room for 16 px per left-side port. */
export const sumDiameter = (count: number): number => Math.max(48, (1 + Math.max(1, count - 2)) * 16);
