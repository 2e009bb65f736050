import { pino, type Logger } from 'pino';

/**
 * A real logger that keeps the app's error lines in memory instead of printing them, so a 5xx
 * can be reported with the stack the error handler logged for it and a passing run stays quiet.
 */
export function capturingLogger(): { logger: Logger; takeErrors: () => string[] } {
  const lines: string[] = [];
  const logger = pino(
    { level: 'error', base: undefined, redact: ['req.headers.cookie'] },
    { write: (line: string) => void lines.push(line) },
  );
  return { logger, takeErrors: () => lines.splice(0).map(readable) };
}

function readable(line: string): string {
  try {
    const entry = JSON.parse(line) as { msg?: string; err?: { stack?: string }; url?: string };
    return `    ${entry.msg ?? ''} ${entry.url ?? ''}\n${indent(entry.err?.stack ?? '')}`;
  } catch {
    return `    ${line}`;
  }
}

const indent = (text: string) =>
  text
    .split('\n')
    .map((line) => `      ${line}`)
    .join('\n');
