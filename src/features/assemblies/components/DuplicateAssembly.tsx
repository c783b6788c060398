import { useId, useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { NamedOptions } from '../../../components/ui/Options';
import { Select } from '../../../components/ui/Select';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { useDuplicateAssembly } from '../api/duplicate-assembly';

type Targets = { id: string; name: string }[];

/**
 * "Duplicate…": a copy of the assembly's current revision as revision 1 of a new assembly, in this project
 * or another one the person may edit (`targets`, already filtered by the page), then opens the copy.
 */
export function DuplicateAssembly({
  assembly,
  projectId,
  targets,
}: {
  assembly: { id: string; name: string };
  projectId: string;
  targets: Targets;
}) {
  const [open, setOpen] = useState(false);
  const formId = useId();
  if (targets.length === 0) return null;
  if (!open)
    return (
      <Button variant="secondary" onClick={() => setOpen(true)} aria-expanded={false} aria-controls={formId}>
        Duplicate…
      </Button>
    );
  return (
    <DuplicateAssemblyForm
      id={formId}
      assembly={assembly}
      projectId={projectId}
      targets={targets}
      onCancel={() => setOpen(false)}
      className="border border-rule bg-paper-raised p-4"
    />
  );
}

/**
 * The duplicate form: into which project (this one first), the copy's name; "Make the copy" opens it. On the
 * assembly page below its button, on the assembly list in a dialog.
 */
export function DuplicateAssemblyForm({
  id,
  assembly,
  projectId,
  targets,
  onCancel,
  className = '',
}: {
  id?: string;
  assembly: { id: string; name: string };
  projectId: string;
  targets: Targets;
  onCancel: () => void;
  className?: string;
}) {
  const [target, setTarget] = useState(targets.some((p) => p.id === projectId) ? projectId : targets[0]?.id);
  const [name, setName] = useState(`${assembly.name} (copy)`);
  const duplicate = useDuplicateAssembly();
  const navigate = useNavigate();
  if (target === undefined) return null;

  return (
    <form
      id={id}
      aria-label="Duplicate this assembly"
      className={`flex flex-col gap-3 ${className}`}
      onSubmit={(e) => {
        e.preventDefault();
        duplicate.mutate(
          { assemblyId: assembly.id, projectId: target, name: name.trim() },
          { onSuccess: (copy) => navigate(`/projects/${copy.projectId}/assemblies/${copy.id}`) },
        );
      }}
    >
      <p className="text-sm">
        The copy starts at revision 1 with the current revision’s values and a note saying where it came from.
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <Field label="Into project">
          {(c) => (
            <Select {...c} value={target} onChange={(e) => setTarget(e.target.value)}>
              <NamedOptions items={targets} />
            </Select>
          )}
        </Field>
        <Field label="Name of the copy" required>
          {(c) => (
            <TextInput
              {...c}
              data-autofocus
              value={name}
              required
              maxLength={200}
              onChange={(e) => setName(e.target.value)}
            />
          )}
        </Field>
      </div>
      {duplicate.isError ? <Notice tone="caution" title={errorMessage(duplicate.error)} live /> : null}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" busy={duplicate.isPending} busyLabel="Copying…">
          Make the copy
        </Button>
        <Button variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
