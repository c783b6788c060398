import type { Project } from '@shared/schemas/project';
import { useId, useState } from 'react';
import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/Button';
import { Field } from '../../../components/ui/Field';
import { Notice } from '../../../components/ui/Notice';
import { TextInput } from '../../../components/ui/TextInput';
import { errorMessage } from '../../../lib/api';
import { useDuplicateProject } from '../api/duplicate-project';

/** "Duplicate…": a new project with this one's site data, wind, climate and assemblies; you its only member. */
export function DuplicateProject({ project }: { project: Project }) {
  const [open, setOpen] = useState(false);
  const [name, setName] = useState(`${project.name} (copy)`);
  const [number, setNumber] = useState(project.number);
  const duplicate = useDuplicateProject();
  const navigate = useNavigate();
  const formId = useId();
  if (!open)
    return (
      <div>
        <Button
          variant="secondary"
          onClick={() => setOpen(true)}
          aria-expanded={false}
          aria-controls={formId}
        >
          Duplicate…
        </Button>
      </div>
    );
  return (
    <form
      id={formId}
      aria-label="Duplicate this project"
      className="flex max-w-form flex-col gap-3 border border-rule bg-paper-raised p-4"
      onSubmit={(e) => {
        e.preventDefault();
        duplicate.mutate(
          { id: project.id, name: name.trim(), number: number.trim() },
          { onSuccess: (copy) => navigate(`/projects/${copy.id}`) },
        );
      }}
    >
      <p className="text-sm">
        The copy has this project’s site data, wind data, climate and every assembly at its current revision
        (as revision 1). You are its only member; invite the others you need.
      </p>
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr]">
        <Field label="Name of the copy" required>
          {(c) => (
            <TextInput
              {...c}
              value={name}
              required
              maxLength={200}
              onChange={(e) => setName(e.target.value)}
            />
          )}
        </Field>
        <Field label="Project number">
          {(c) => (
            <TextInput {...c} value={number} maxLength={50} onChange={(e) => setNumber(e.target.value)} />
          )}
        </Field>
      </div>
      {duplicate.isError ? <Notice tone="caution" title={errorMessage(duplicate.error)} live /> : null}
      <div className="flex flex-wrap gap-3">
        <Button type="submit" variant="primary" busy={duplicate.isPending} busyLabel="Copying…">
          Make the copy
        </Button>
        <Button variant="secondary" onClick={() => setOpen(false)}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
