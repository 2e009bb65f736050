import { useState } from 'react';
import { FormProvider, useFieldArray, useForm, useFormContext, type Path } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { ENGINE_KIND_WORDS } from '../../../../shared/programs/program-words';
import {
  EngineKindSchema,
  MAX_PHASES,
  type Program,
} from '../../../../shared/programs/program.schema';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { controlClass, Field, SelectField, TextField } from '../../../components/ui/field';
import { ApiError, isApiError } from '../../../lib/api-client';
import { serverErrorMessages } from '../../../lib/form-errors';
import { useSaveProgram, type ProgramDetail } from '../api';
import {
  formFieldOf,
  formFieldPaths,
  newPhase,
  errorAt,
  numberOptions,
  type ProgramFormValues,
} from '../form-values';
import { formValuesOf, ProgramFormSchema } from '../program-form-schema';
import { PhaseFields } from './phase-fields';

/** Which engines the program is written for: the assign card lists suiting programs first. */
function SuitsFields() {
  const { register, formState } = useFormContext<ProgramFormValues>();
  const error = (name: string) => errorAt(formState.errors, name);
  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <SelectField
        label="Written for"
        error={error('suits.engineKind')}
        {...register('suits.engineKind')}
      >
        {EngineKindSchema.options.map((kind) => (
          <option key={kind} value={kind}>
            {ENGINE_KIND_WORDS[kind]}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Engines it suits, in your words"
        hint="Optional, e.g. 40–60 hp four-stroke outboards"
        error={error('suits.label')}
        {...register('suits.label')}
      />
    </div>
  );
}

/** The program's name, notes and first service. */
function ProgramDetailsCard() {
  const { register, formState } = useFormContext<ProgramFormValues>();
  const error = (name: string) => errorAt(formState.errors, name);
  return (
    <Card title="Program">
      <div className="flex flex-col gap-4">
        <TextField label="Program name" error={error('name')} {...register('name')} />
        <SuitsFields />
        <Field label="Notes" error={error('notes')}>
          {(c) => (
            <textarea {...c} rows={3} className={`${controlClass} py-2`} {...register('notes')} />
          )}
        </Field>
        <div className="grid gap-3 sm:grid-cols-2">
          <TextField
            label="First service after (engine hours)"
            inputMode="decimal"
            error={
              error('firstService.hours') ?? error('firstService.root') ?? error('firstService')
            }
            {...register('firstService.hours', numberOptions)}
          />
          <TextField
            label="First service after (months)"
            inputMode="numeric"
            error={error('firstService.months')}
            {...register('firstService.months', numberOptions)}
          />
        </div>
      </div>
    </Card>
  );
}

/** Every phase in order, each movable and removable, and a way to add one. */
function PhaseCards() {
  const { control } = useFormContext<ProgramFormValues>();
  const phases = useFieldArray({ control, name: 'phases' });
  return (
    <>
      <h2 className="text-xl font-bold">Phases ({phases.fields.length})</h2>
      {phases.fields.map((field, index) => (
        <PhaseFields
          key={field.id}
          index={index}
          count={phases.fields.length}
          onMove={phases.move}
          onRemove={phases.remove}
        />
      ))}
      <Button
        variant="secondary"
        className="self-start"
        disabled={phases.fields.length >= MAX_PHASES}
        onClick={() => phases.append(newPhase())}
      >
        Add phase
      </Button>
    </>
  );
}

/** What the last save came to: what the server refused, or that it was saved. */
function SaveOutcome({ problems, saved }: { problems: string[]; saved: boolean }) {
  return (
    <>
      {problems.length > 0 && (
        <Alert title="The program was not saved">
          {problems.map((p) => (
            <p key={p}>{p}</p>
          ))}
        </Alert>
      )}
      {saved && (
        <p role="status" className="font-semibold">
          Program saved.
        </p>
      )}
    </>
  );
}

/** The server's refusal with its field names as the form names them (percent, not share). */
const onFormFields = (error: Error): Error =>
  isApiError(error)
    ? new ApiError({
        ...error.problem,
        errors: error.fieldErrors.map((e) => ({ ...e, field: formFieldOf(e.field) })),
      })
    : error;

/** Edits a workshop's own program. The server checks it again and names any field it refuses. */
export function ProgramForm({ program }: { program: ProgramDetail }) {
  const form = useForm<ProgramFormValues, unknown, Program>({
    resolver: zodResolver(ProgramFormSchema),
    defaultValues: formValuesOf(program.definition),
  });
  const { handleSubmit, setError, reset } = form;
  const save = useSaveProgram(program.id);
  const [problems, setProblems] = useState<string[]>([]);
  const [saved, setSaved] = useState(false);

  const onSubmit = handleSubmit((definition) => {
    setProblems([]);
    setSaved(false);
    save.mutate(definition, {
      onSuccess: (data) => {
        reset(formValuesOf(data.program.definition));
        setSaved(true);
      },
      onError: (failure) => {
        const fields = formFieldPaths(definition.phases.length) as Path<ProgramFormValues>[];
        setProblems(
          serverErrorMessages(onFormFields(failure), setError, fields, { pointToFields: true }),
        );
      },
    });
  });

  return (
    <FormProvider {...form}>
      <form
        noValidate
        onSubmit={onSubmit}
        className="flex flex-col gap-5"
        aria-label="Edit program"
      >
        <ProgramDetailsCard />
        <PhaseCards />
        <SaveOutcome problems={problems} saved={saved} />
        <Button
          type="submit"
          className="self-start"
          pending={save.isPending}
          pendingLabel="Saving…"
        >
          Save program
        </Button>
      </form>
    </FormProvider>
  );
}
