import type { Assembly, AssemblyInput } from '@shared/schemas/assembly';
import type { Project } from '@shared/schemas/project';
import type { UnitSystem } from '@shared/units';
import { useForm, useWatch } from 'react-hook-form';
import { useDeferredCalculation } from '../../lib/deferred-calculation';
import { type RevisionApi, useRevisionEditing } from '../../lib/use-revision-editing';
import { evaluateAttachment } from './evaluate';
import { type AttachmentFormValues, attachmentFormValues, toFormPath, withAttachment } from './form';

/*
 * The attachment page's inputs while they are edited (design spacings, panel table, clip), computed live, and
 * saved as a new revision of the assembly by the shared revision editing (src/lib/use-revision-editing.ts). A stale
 * save (409) carries this person's values onto the saved revision as they are.
 */

export type AttachmentEditingOptions = RevisionApi & {
  assembly: Assembly;
  project: Project;
  system: UnitSystem;
};

export interface AttachmentCarry {
  /** Their revision changed the wind inputs too (then carrying over keeps mine there). */
  theyChangedWind: boolean;
}

/** The part of an assembly this page owns, for comparing revisions. */
const windPart = (a: AssemblyInput) =>
  JSON.stringify({
    g: a.attachment.girtSpacing ?? null,
    c: a.attachment.clipSpacing ?? null,
    p: a.windPanel ?? null,
  });

/** Where a server reason sits on this page, or null when it is about another part of the assembly. */
function attachmentFieldPath(serverPath: string): string | null {
  const path = serverPath.replace(/^input\./, '');
  if (path.startsWith('windPanel.')) return toFormPath(path);
  if (path === 'attachment.girtSpacing' || path === 'attachment.clipSpacing')
    return path.slice('attachment.'.length);
  return null;
}

export function useAttachmentEditing({ project, system, ...io }: AttachmentEditingOptions) {
  const form = useForm<AttachmentFormValues>({
    defaultValues: attachmentFormValues(io.assembly.current.input),
  });
  const { control, reset, formState } = form;
  const values = useWatch({ control }) as AttachmentFormValues;

  const editing = useRevisionEditing<AttachmentFormValues, AttachmentCarry>({
    ...io,
    values,
    isEdited: () => formState.isDirty,
    reset: (next, why) => reset(next, why === 'history' ? { keepDefaultValues: true } : undefined),
    formValues: attachmentFormValues,
    toInput: (v, base) => {
      const evaluation = evaluateAttachment(v, base.current.input, project, system);
      if (Object.keys(evaluation.errors).length > 0)
        return { problem: ['Some values cannot be used yet — put right the values marked ✕ first.'] };
      if (!evaluation.panel && base.current.input.windPanel)
        return {
          problem: [
            'The panel table and clip are empty. Enter them again, or undo your edits to keep the saved ones.',
          ],
        };
      return { input: withAttachment(base.current.input, evaluation.panel, evaluation.design) };
    },
    carryOver: ({ base, values: mine, theirs }) => ({
      values: mine,
      detail: { theyChangedWind: windPart(theirs.current.input) !== windPart(base.current.input) },
    }),
    fieldPath: attachmentFieldPath,
  });

  const { base } = editing;
  // Every figure of the page comes from this one, possibly deferred, evaluation (`stale` while it lags).
  const { result: evaluation, stale } = useDeferredCalculation(
    values,
    (v) => evaluateAttachment(v, base.current.input, project, system),
    [base, project, system],
  );

  return {
    ...editing,
    form,
    values,
    evaluation,
    stale,
    errors: { ...editing.serverErrors, ...evaluation.errors },
  };
}

export type AttachmentEditing = ReturnType<typeof useAttachmentEditing>;
