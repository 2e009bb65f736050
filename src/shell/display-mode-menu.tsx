import { useEffect, useId, useRef, useState, type RefObject } from 'react';
import { HalfIcon, MoonIcon, SunIcon } from '../components/ui/icons';
import { buttonClass } from '../components/ui/button';
import { cx } from '../components/ui/cx';
import { DISPLAY_MODES, useDisplayMode, type DisplayMode } from '../lib/display-mode';

const modes: Record<DisplayMode, { label: string; note: string; Icon: typeof SunIcon }> = {
  day: { label: 'Day', note: 'Dark ink on paper, for sunlight', Icon: SunIcon },
  night: { label: 'Night', note: 'Dim red on black, keeps night vision', Icon: MoonIcon },
  system: { label: 'System', note: 'Follows this device', Icon: HalfIcon },
};

/** While open, a press anywhere outside `root` closes it. */
function useCloseOnOutsidePointer(
  open: boolean,
  root: RefObject<HTMLElement | null>,
  setOpen: (open: boolean) => void,
) {
  useEffect(() => {
    if (!open) return;
    const closeOutside = (event: PointerEvent) => {
      if (!root.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('pointerdown', closeOutside);
    return () => document.removeEventListener('pointerdown', closeOutside);
  }, [open, root, setOpen]);
}

function ModeButton({
  value,
  chosen,
  noteId,
  onChoose,
}: {
  value: DisplayMode;
  chosen: boolean;
  noteId: string;
  onChoose: (mode: DisplayMode) => void;
}) {
  const { label, note, Icon } = modes[value];
  return (
    <button
      type="button"
      aria-pressed={chosen}
      onClick={() => onChoose(value)}
      aria-label={label}
      aria-describedby={noteId}
      className={cx(
        'flex min-h-touch items-center gap-3 rounded-md border-2 px-3 py-2 text-left',
        chosen ? 'border-ink bg-sunk font-bold' : 'border-transparent hover:border-line',
      )}
    >
      <Icon />
      <span className="flex flex-col">
        <span>{label}</span>
        <span id={noteId} className="text-sm font-normal text-muted">
          {note}
        </span>
      </span>
    </button>
  );
}

function ModeChoices({
  panelId,
  mode,
  onChoose,
}: {
  panelId: string;
  mode: DisplayMode;
  onChoose: (mode: DisplayMode) => void;
}) {
  return (
    <div
      id={panelId}
      role="group"
      aria-label="Choose display mode"
      className="fixed inset-x-2 top-16 z-30 flex flex-col gap-1 rounded-lg border-2 border-ink bg-surface p-2 sm:absolute sm:inset-x-auto sm:right-0 sm:top-full sm:mt-2 sm:w-72"
    >
      {DISPLAY_MODES.map((value) => (
        <ModeButton
          key={value}
          value={value}
          chosen={mode === value}
          noteId={`${panelId}-${value}`}
          onChoose={onChoose}
        />
      ))}
    </div>
  );
}

/** Header control for day, night or system display; the choice is kept on this device. */
export function DisplayModeMenu() {
  const [mode, setMode] = useDisplayMode();
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const Current = modes[mode].Icon;

  useCloseOnOutsidePointer(open, rootRef, setOpen);

  const choose = (next: DisplayMode) => {
    setMode(next);
    setOpen(false);
    buttonRef.current?.focus();
  };

  return (
    <div
      ref={rootRef}
      className="relative"
      onKeyDown={(event) => {
        if (event.key === 'Escape' && open) {
          setOpen(false);
          buttonRef.current?.focus();
        }
      }}
    >
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        title={`Display mode: ${modes[mode].label}`}
        onClick={() => setOpen((was) => !was)}
        className={buttonClass('secondary', 'px-2 sm:px-3')}
      >
        <Current />
        <span className="sr-only sm:not-sr-only">Display mode</span>
      </button>
      {open && <ModeChoices panelId={panelId} mode={mode} onChoose={choose} />}
    </div>
  );
}
