import type { DesignDocument } from '@/domain/design/schema';

/**
 * Every edit in the editor is a command: a readable label for the history buttons, a pure
 * `apply`, an optional exact `undo` (the store restores snapshots, so undo is for replay and
 * group commands), and a JSON form that names parts by id only.
 */
export interface EditorCommand {
  label: string;
  apply(design: DesignDocument): DesignDocument;
  undo?(design: DesignDocument): DesignDocument;
  toJSON(): unknown;
}

/** Thrown by a command that cannot apply to the design it was given; the store leaves the design unchanged. */
export class CommandRefusedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CommandRefusedError';
  }
}
