/** The one shape every API error has. */
export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    /** Field path (dotted, e.g. `config.chassis.wheels.0.radiusMm`) → reason. */
    fields?: Record<string, string>;
    [detail: string]: unknown;
  };
}
