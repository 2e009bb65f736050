import { describe, expect, it, vi } from 'vitest';
import { ApiError } from './api-client';
import { MARKED_FIELDS_NOTE, serverErrorMessages } from './form-errors';

type Values = { name: string; hin: string };
const FIELDS = ['name', 'hin'] as const;

const refused = (errors?: Array<{ field: string; message: string }>) =>
  new ApiError({
    type: 'about:blank',
    title: 'Bad Request',
    status: 400,
    detail: 'The vessel was not saved.',
    errors,
  });

function run(error: unknown, pointToFields?: boolean) {
  const setError = vi.fn();
  const messages = serverErrorMessages<Values>(error, setError, FIELDS, { pointToFields });
  return { messages, setError };
}

describe('serverErrorMessages', () => {
  it('puts each message on its field and leaves the alert empty when all of them fit', () => {
    const { messages, setError } = run(
      refused([
        { field: 'name', message: 'Enter the vessel name.' },
        { field: 'hin', message: 'A HIN has 12 to 14 letters and digits.' },
      ]),
    );
    expect(messages).toEqual([]);
    expect(setError.mock.calls).toEqual([
      ['name', { type: 'server', message: 'Enter the vessel name.' }, { shouldFocus: true }],
      [
        'hin',
        { type: 'server', message: 'A HIN has 12 to 14 letters and digits.' },
        { shouldFocus: true },
      ],
    ]);
  });

  it('says the messages for fields the form does not have', () => {
    const { messages, setError } = run(
      refused([
        { field: 'name', message: 'Enter the vessel name.' },
        { field: 'skipperIds', message: 'A skipper is no longer in this workshop.' },
      ]),
    );
    expect(messages).toEqual(['A skipper is no longer in this workshop.']);
    expect(setError).toHaveBeenCalledTimes(1);
  });

  it("says the error's own message when it names no field", () => {
    expect(run(refused()).messages).toEqual(['The vessel was not saved.']);
  });

  it('says something went wrong for an error that is not an answer from the server', () => {
    const { messages, setError } = run(new TypeError('boom'));
    expect(messages).toEqual(['Something went wrong. Try again.']);
    expect(setError).not.toHaveBeenCalled();
  });

  describe('pointing to the marked fields', () => {
    it('adds the note after the left-over messages when some went on fields', () => {
      const error = refused([
        { field: 'skipperIds', message: 'A skipper is no longer in this workshop.' },
        { field: 'name', message: 'Enter the vessel name.' },
      ]);
      expect(run(error, true).messages).toEqual([
        'A skipper is no longer in this workshop.',
        MARKED_FIELDS_NOTE,
      ]);
      expect(MARKED_FIELDS_NOTE).toBe('Check the fields marked ⚠ above.');
    });

    it('gives only the note when every message went on a field', () => {
      const error = refused([{ field: 'name', message: 'Enter the vessel name.' }]);
      expect(run(error, true).messages).toEqual([MARKED_FIELDS_NOTE]);
    });

    it('adds no note when nothing went on a field', () => {
      const error = refused([{ field: 'phases.9.rpmMax', message: 'There is no phase 10.' }]);
      expect(run(error, true).messages).toEqual(['There is no phase 10.']);
      expect(run(refused(), true).messages).toEqual(['The vessel was not saved.']);
    });
  });
});
