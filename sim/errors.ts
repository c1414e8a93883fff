/**
 * The one error type of the engine. Every problem with a circuit — bad JSON, an unknown kind, a value that does
 * not parse, a net with no DC path, a singular matrix — is a `SimError` with a stable `code`, a message a person
 * can act on (which part, which field or net, what to change), and the part or net at fault.
 */
export type SimErrorCode =
  | "malformed_json"
  | "invalid_file"
  | "unknown_kind"
  | "unknown_pin"
  | "missing_pin"
  | "duplicate_id"
  | "invalid_value"
  | "wrong_unit"
  | "out_of_range"
  | "unknown_parameter"
  | "unknown_variant"
  | "unknown_part"
  | "no_dc_path"
  | "source_loop"
  | "shorted_source"
  | "unknown_output_net"
  | "singular_circuit"
  | "no_convergence"
  | "invalid_analysis";

export interface SimErrorJson {
  code: SimErrorCode;
  message: string;
  part?: string;
  net?: string;
  field?: string;
}

export class SimError extends Error {
  readonly code: SimErrorCode;
  readonly part?: string;
  readonly net?: string;
  readonly field?: string;

  constructor(code: SimErrorCode, message: string, where: { part?: string; net?: string; field?: string } = {}) {
    super(message);
    this.name = "SimError";
    this.code = code;
    this.part = where.part;
    this.net = where.net;
    this.field = where.field;
  }

  toJSON(): SimErrorJson {
    const out: SimErrorJson = { code: this.code, message: this.message };
    if (this.part !== undefined) out.part = this.part;
    if (this.net !== undefined) out.net = this.net;
    if (this.field !== undefined) out.field = this.field;
    return out;
  }
}

export function isSimError(e: unknown): e is SimError {
  return e instanceof SimError;
}
