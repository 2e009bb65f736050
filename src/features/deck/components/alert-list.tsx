import type { DeckAlert, DeckReminder } from '../deck-alerts';

/** Alerts (a rule broken now) above reminders (a rule about to be); each with a mark, not colour alone. */
export function AlertList({
  alerts,
  reminders,
}: {
  alerts: DeckAlert[];
  reminders: DeckReminder[];
}) {
  if (alerts.length === 0 && reminders.length === 0) return null;
  return (
    <ul className="flex flex-col gap-2">
      {alerts.map((alert) => (
        <li
          key={alert.code}
          role="alert"
          className="rounded-md border-4 border-danger bg-surface p-2"
        >
          <p className="flex items-center gap-2 text-lg font-extrabold text-danger">
            <span aria-hidden="true" className="figures">
              !!
            </span>
            <span>{alert.title}</span>
          </p>
          <p className="text-sm">{alert.message}</p>
        </li>
      ))}
      {reminders.map((reminder) => (
        <li
          key={reminder.code}
          className="rounded-md border-2 border-dashed border-ink bg-surface p-2"
        >
          <p className="font-bold">
            <span aria-hidden="true">⏱ </span>
            {reminder.title}
          </p>
          <p className="text-sm">{reminder.message}</p>
        </li>
      ))}
    </ul>
  );
}
