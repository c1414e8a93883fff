/**
 * The choices made in a measurement's preview before it is saved: which kind of curve, its name, which column holds
 * what, and the units. Shared by the bench's upload form, the upload route and the parser.
 */
import { z } from "zod";

export const MEASUREMENT_KINDS = ["frequency_response", "noise_spectrum"] as const;
export const FREQUENCY_UNITS = ["Hz", "kHz"] as const;
/** dB (relative), dBV (re 1 V), dBu (re 0.7746 V), V (linear volts; a noise spectrum's V/√Hz). */
export const LEVEL_UNITS = ["dB", "dBV", "dBu", "V"] as const;

const column = (what: string) =>
  z
    .number({ error: `Choose the ${what} column.` })
    .int(`Choose the ${what} column.`)
    .min(0, `Choose the ${what} column.`)
    .max(63, `The ${what} column must be one of the file's first 64 columns.`);

export const measurementMappingSchema = z
  .object({
    kind: z.enum(MEASUREMENT_KINDS, { error: "Choose frequency response or noise spectrum." }),
    name: z.string().trim().min(1, "Give the measurement a name.").max(120, "Keep the name to 120 characters."),
    frequencyColumn: column("frequency"),
    levelColumn: column("level"),
    phaseColumn: column("phase").nullable().default(null),
    frequencyUnit: z.enum(FREQUENCY_UNITS, { error: "Choose Hz or kHz for the frequency." }),
    levelUnit: z.enum(LEVEL_UNITS, { error: "Choose dB, dBV, dBu or V for the level." }),
  })
  .refine((m) => m.frequencyColumn !== m.levelColumn, {
    path: ["levelColumn"],
    message: "The level must come from a different column than the frequency.",
  })
  .refine((m) => m.phaseColumn === null || (m.phaseColumn !== m.frequencyColumn && m.phaseColumn !== m.levelColumn), {
    path: ["phaseColumn"],
    message: "The phase must come from its own column.",
  });

export type MeasurementMapping = z.infer<typeof measurementMappingSchema>;
export type MeasurementMappingInput = z.input<typeof measurementMappingSchema>;
