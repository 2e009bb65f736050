import { Pill } from '../../../components/ui/pill';
import type { EngineRow } from '../../../../shared/vessels/vessel-view';

export type ChecklistState = 'not-started' | 'in-progress' | 'completed';

export const checklistStateOf = (engine: Pick<EngineRow, 'checklist'>): ChecklistState =>
  !engine.checklist ? 'not-started' : engine.checklist.completedAt ? 'completed' : 'in-progress';

const words: Record<
  ChecklistState,
  { word: string; mark: string; tone: 'solid' | 'outline' | 'quiet' }
> = {
  completed: { word: 'Checklist done', mark: '✓', tone: 'solid' },
  'in-progress': { word: 'Checklist started', mark: '◐', tone: 'outline' },
  'not-started': { word: 'No checklist yet', mark: '○', tone: 'quiet' },
};

/** The commissioning checklist's state as word, mark and shape (never colour alone). */
export function ChecklistPill({ engine }: { engine: Pick<EngineRow, 'checklist'> }) {
  const { word, mark, tone } = words[checklistStateOf(engine)];
  return (
    <Pill tone={tone} className={tone === 'quiet' ? 'border-dashed' : undefined}>
      <span aria-hidden="true">{mark}</span>
      {word}
    </Pill>
  );
}

export function ArchivedPill({ archivedAt }: { archivedAt: string | null | undefined }) {
  if (!archivedAt) return null;
  return (
    <Pill tone="quiet" className="border-dashed">
      Archived
    </Pill>
  );
}
