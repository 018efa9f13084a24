/**
 * Create or edit a project in a Sheet. The form checks itself with the same zod schema the server uses and puts
 * each message (its own or the server's `fields`) beside the field it is about.
 */
import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { createProject, updateProject } from '@/lib/api/projects';
import {
  createProjectBodySchema,
  PROJECT_NOTES_MAX,
  updateProjectBodySchema,
  type Project,
} from '@/lib/schema/api-projects';
import { Banner } from '@/components/ui/banner';
import { Button } from '@/components/ui/button';
import { fieldErrorsFromApi, messageOf, validate, type FieldErrors } from '@/components/ui/form-errors';
import { Sheet } from '@/components/ui/sheet';
import { TextField } from '@/components/ui/text-field';
import { useFormFields } from '@/components/ui/use-form-fields';

interface Values {
  name: string;
  client: string;
  site: string;
  notes: string;
}

const empty: Values = { name: '', client: '', site: '', notes: '' };

function valuesOf(p: Project | undefined): Values {
  return p ? { name: p.name, client: p.client ?? '', site: p.site ?? '', notes: p.notes ?? '' } : empty;
}

export function ProjectFormSheet({
  open,
  onClose,
  teamId,
  project,
  onSaved,
}: {
  open: boolean;
  onClose: () => void;
  /** Team the new project belongs to (create mode). */
  teamId?: string;
  /** The project being edited (edit mode). */
  project?: Project;
  onSaved?: (project: Project) => void;
}) {
  const queryClient = useQueryClient();
  const editing = Boolean(project);
  const form = useFormFields<Values>(valuesOf(project));
  const { values, setValues, setErrors } = form;

  const mutation = useMutation({
    mutationFn: async (v: Values) => {
      if (project) {
        const r = validate(updateProjectBodySchema, v);
        if (!r.data) throw new FormInvalid(r.errors);
        return updateProject(project.id, r.data);
      }
      const r = validate(createProjectBodySchema, v);
      if (!r.data) throw new FormInvalid(r.errors);
      if (!teamId) throw new Error('No team is selected.');
      return createProject(teamId, r.data);
    },
    onSuccess: (saved) => {
      queryClient.setQueryData(['project', saved.id], saved);
      void queryClient.invalidateQueries({ queryKey: ['projects'] });
      onSaved?.(saved);
      onClose();
    },
    onError: (err) => setErrors(err instanceof FormInvalid ? err.fields : fieldErrorsFromApi(err)),
  });

  // Start from the project's current values (or blank) each time the sheet opens.
  useEffect(() => {
    if (open) {
      setValues(valuesOf(project));
      setErrors({});
      mutation.reset();
    }
    // eslint-disable-next-line react-hooks/exhaustive-deps -- reset only when the sheet opens
  }, [open]);

  const submit = () => {
    const r = validate(editing ? updateProjectBodySchema : createProjectBodySchema, values);
    setErrors(r.errors ?? {});
    if (r.data) mutation.mutate(values);
  };
  const formError =
    mutation.error && !(mutation.error instanceof FormInvalid) && Object.keys(fieldErrorsFromApi(mutation.error)).length === 0
      ? messageOf(mutation.error)
      : null;

  return (
    <Sheet
      open={open}
      onClose={onClose}
      title={editing ? 'Edit project' : 'New project'}
      testID="project-form"
      footer={
        <>
          <Button label="Cancel" variant="secondary" onPress={onClose} />
          <Button
            label={editing ? 'Save changes' : 'Create project'}
            onPress={submit}
            loading={mutation.isPending}
            testID="project-form-submit"
          />
        </>
      }
    >
      {formError ? (
        <Banner tone="error" title={editing ? 'Could not save the project' : 'Could not create the project'}>
          {formError}
        </Banner>
      ) : null}
      <TextField label="Project name" {...form.field('name')} testID="project-name" autoFocus />
      <TextField
        label="Client"
        {...form.field('client')}
        hint="Optional. Who the coils are for."
        testID="project-client"
      />
      <TextField
        label="Site"
        {...form.field('site')}
        hint="Optional. Building or plant where the coils go."
        testID="project-site"
      />
      <TextField
        label="Notes"
        {...form.field('notes')}
        hint={`Optional. Up to ${PROJECT_NOTES_MAX} characters.`}
        multiline
        testID="project-notes"
      />
    </Sheet>
  );
}

/** Client-side validation failure carried through the mutation so its messages land beside the fields. */
class FormInvalid extends Error {
  constructor(readonly fields: FieldErrors) {
    super('Some fields need attention.');
  }
}
