import { cx } from '../../../components/ui/cx';

const KEYS = ['1', '2', '3', '4', '5', '6', '7', '8', '9', '.', '0', 'back'] as const;

const keyClass =
  'min-h-14 rounded-md border-2 border-ink bg-surface text-2xl font-bold figures active:bg-sunk disabled:opacity-40';

/** A big keypad for wet hands: twelve keys, each at least 56 px tall. */
export function Keypad({
  onKey,
  allowDecimal,
}: {
  onKey: (key: string) => void;
  allowDecimal: boolean;
}) {
  return (
    <div role="group" aria-label="Keypad" className="grid grid-cols-3 gap-2">
      {KEYS.map((key) => (
        <button
          key={key}
          type="button"
          className={keyClass}
          disabled={key === '.' && !allowDecimal}
          aria-label={key === 'back' ? 'Delete last digit' : key === '.' ? 'Decimal point' : key}
          onClick={() => onKey(key)}
        >
          {key === 'back' ? '⌫' : key}
        </button>
      ))}
    </div>
  );
}

interface ChoiceChipsProps<T extends string> {
  label: string;
  options: ReadonlyArray<{ value: T; text: string; name?: string }>;
  value: T | null;
  onChange: (value: T) => void;
  error?: boolean;
}

function Chip({
  text,
  name,
  chosen,
  error,
  onChoose,
}: {
  text: string;
  name?: string;
  chosen: boolean;
  error?: boolean;
  onChoose: () => void;
}) {
  return (
    <button
      type="button"
      role="radio"
      aria-checked={chosen}
      aria-label={name ?? text}
      onClick={onChoose}
      className={cx(
        'relative min-h-touch min-w-touch flex-1 whitespace-nowrap rounded-md border-2 px-2 text-lg font-bold',
        chosen ? 'deck-solid' : 'border-ink bg-surface text-ink',
        error && !chosen && 'border-danger',
      )}
    >
      {/* A tick in the corner as well as the fill: the choice reads without colour. */}
      {chosen && (
        <span aria-hidden="true" className="absolute left-1 top-0 text-sm">
          ✓
        </span>
      )}
      {text}
    </button>
  );
}

/** A row of big single-choice chips (throttle, which engine); the chosen one is filled and ticked. */
export function ChoiceChips<T extends string>({
  label,
  options,
  value,
  onChange,
  error,
}: ChoiceChipsProps<T>) {
  return (
    <div
      role="radiogroup"
      aria-label={label}
      aria-invalid={error || undefined}
      className="flex flex-wrap gap-2"
    >
      {options.map((option) => (
        <Chip
          key={option.value}
          text={option.text}
          name={option.name}
          chosen={option.value === value}
          error={error}
          onChoose={() => onChange(option.value)}
        />
      ))}
    </div>
  );
}
