"use client";
/** The results drawer's "Large signal" tab: the distortion panel and the power-on view, side by side on a wide screen. */
import type { BenchCircuit } from "../document";
import { netNames } from "../document/nets";
import { DistortionPanel } from "./distortion-panel";
import { PowerOnPanel } from "./power-on-panel";
import { driveFrequency, powerOnStop } from "./drive-defaults";
import type { LargeSignalJobs } from "./use-large-signal";

export function LargeSignalPanel({
  jobs,
  circuit,
  variant,
}: {
  jobs: LargeSignalJobs;
  circuit: BenchCircuit;
  variant?: string;
}) {
  const nets = netNames(circuit).filter((n) => n !== "0");
  const hasCapsule = circuit.parts.some((p) => p.kind === "capsule" && p.enabled);
  return (
    <div className="space-y-6">
      <DistortionPanel
        jobs={jobs}
        circuit={circuit}
        variant={variant}
        frequency={driveFrequency(circuit.analyses)}
        nets={nets}
        hasCapsule={hasCapsule}
      />
      <div className="border-t border-rule pt-4">
        <h3 className="mb-2 text-sm font-semibold">Power-on</h3>
        <PowerOnPanel
          jobs={jobs}
          circuit={circuit}
          variant={variant}
          defaultStop={powerOnStop(circuit.analyses)}
          nets={nets}
          hasCapsule={hasCapsule}
        />
      </div>
    </div>
  );
}
