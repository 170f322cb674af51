/**
 * Structure of the Wrenmoor Field: a smooth, gently elongated dome on the top of the Wren
 * Sand, tilted down to the east, with a small undulation; every other formation top hangs
 * from it by smoothly varying isochores (see formations.ts). Map coordinates are feet east
 * (x) and north (y) of the field origin; depths are TVDSS, feet, positive down.
 */

const AXIS_RAD = (30 * Math.PI) / 180;

/**
 * Top of the Wren Sand, TVDSS ft, at (x, y):
 * z = 4898 + 165 (1 - exp(-(u/7500)^2 - (v/4200)^2)) + 0.0015 x + 4 sin(x/2600) cos(y/3100),
 * with (u, v) the map axes turned 30 degrees anticlockwise (the dome's long axis runs N60E).
 */
export function wrenTopTvdss(x: number, y: number): number {
  const u = x * Math.cos(AXIS_RAD) + y * Math.sin(AXIS_RAD);
  const v = -x * Math.sin(AXIS_RAD) + y * Math.cos(AXIS_RAD);
  const dome = 165 * (1 - Math.exp(-((u / 7500) ** 2) - (v / 4200) ** 2));
  return 4898 + dome + 0.0015 * x + 4 * Math.sin(x / 2600) * Math.cos(y / 3100);
}

/** Area (acres) of the map where `top(x, y) < level`, counted on a square grid of `cellFt` cells over +-`halfWidthFt`. */
export function areaAboveLevelAcres(
  top: (x: number, y: number) => number,
  level: number,
  cellFt = 100,
  halfWidthFt = 20000,
): number {
  let cells = 0;
  const n = Math.round((2 * halfWidthFt) / cellFt);
  for (let i = 0; i < n; i++) {
    const x = -halfWidthFt + (i + 0.5) * cellFt;
    for (let j = 0; j < n; j++) {
      const y = -halfWidthFt + (j + 0.5) * cellFt;
      if (top(x, y) < level) cells++;
    }
  }
  // 43,560 ft2 per acre (Thompson & Taylor 2008, NIST SP 811).
  return (cells * cellFt * cellFt) / 43560;
}
