/** The few logging calls the server makes; tests pass a silent or recording logger. */
export interface Logger {
  info(message: string, details?: unknown): void;
  warn(message: string, details?: unknown): void;
  error(message: string, details?: unknown): void;
}

export const consoleLogger: Logger = {
  info: (message, details) => (details === undefined ? console.log(message) : console.log(message, details)),
  warn: (message, details) => (details === undefined ? console.warn(message) : console.warn(message, details)),
  error: (message, details) => (details === undefined ? console.error(message) : console.error(message, details)),
};

export const silentLogger: Logger = { info() {}, warn() {}, error() {} };
