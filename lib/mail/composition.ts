import type { ReactElement } from "react";

/** A message ready to render: the template element plus anything the envelope needs. */
export type Composition = {
  element: ReactElement;
  headers?: Record<string, string>;
  replyTo?: string;
  /** Removes what must not outlive delivery (a sealed reset token) once the message is sent. */
  scrubbedPayload?: Record<string, unknown>;
};
