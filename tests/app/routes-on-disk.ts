/**
 * The route handlers on disk: app/**\/route.ts → "/api/…/[param]" → its exported HTTP methods, read from the source.
 * The per-route tables of the app tests (route-access, bad-input-routes) check themselves against this list, so a
 * new route or method without a row fails them.
 */
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";

const APP_DIR = path.resolve(import.meta.dirname, "../../app");
export const METHODS = ["GET", "POST", "PUT", "PATCH", "DELETE"] as const;
export type Method = (typeof METHODS)[number];

export function routesOnDisk(): Map<string, Method[]> {
  const found = new Map<string, Method[]>();
  const walk = (dir: string) => {
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const full = path.join(dir, entry.name);
      if (entry.isDirectory()) walk(full);
      else if (entry.name === "route.ts") {
        const source = readFileSync(full, "utf8");
        const methods = METHODS.filter((m) =>
          new RegExp(`export\\s+(const|async\\s+function|function)\\s+${m}\\b|\\bas\\s+${m}\\b`).test(source),
        );
        const route = `/${path.relative(APP_DIR, dir).split(path.sep).filter((s) => !/^\(.*\)$/.test(s)).join("/")}`;
        found.set(route, methods);
      }
    }
  };
  walk(APP_DIR);
  return found;
}

/** What the table holds that the disk does not, and the other way round, as "METHOD /route" lines. */
export function tableMismatch(table: Record<string, Partial<Record<Method, unknown>>>): { missing: string[]; stale: string[] } {
  const onDisk = routesOnDisk();
  const missing: string[] = [];
  for (const [route, methods] of onDisk) {
    for (const method of methods) if (!table[route]?.[method]) missing.push(`${method} ${route}`);
  }
  const stale = Object.entries(table).flatMap(([route, rules]) =>
    Object.keys(rules).filter((m) => !onDisk.get(route)?.includes(m as Method)).map((m) => `${m} ${route}`),
  );
  return { missing, stale };
}
