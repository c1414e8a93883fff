/**
 * The bench's solver, off the main thread so typing never waits for the engine. Imports only sim/ (through
 * compute.ts) and comlink. The bench runs two of these: one for the live solve, one for long jobs (families,
 * sweeps, spreads, explanations, the large-signal runs) that it cancels by terminating the worker.
 */
import * as Comlink from "comlink";
import {
  type DistortionJobRequest,
  type PowerOnJobRequest,
  solveDistortionJob,
  solvePowerOnJob,
} from "../large-signal/compute-large-signal";
import { explainFigures, solveFamily, solveImpedance, solveLive } from "./compute";
import type { ExplainRequest, FamilyRequest, LiveRequest, ProgressCallback } from "./protocol";

const api = {
  live: (request: LiveRequest) => solveLive(request),
  impedance: (request: LiveRequest, frequencies: number[]) => solveImpedance(request, frequencies),
  family: (request: FamilyRequest, onProgress: ProgressCallback) => solveFamily(request, onProgress),
  explain: (request: ExplainRequest, onProgress: ProgressCallback) => explainFigures(request, onProgress),
  distortion: (request: DistortionJobRequest, onProgress: ProgressCallback) => solveDistortionJob(request, onProgress),
  powerOn: (request: PowerOnJobRequest, onProgress: ProgressCallback) => solvePowerOnJob(request, onProgress),
};

export type SolverApi = typeof api;

Comlink.expose(api);
