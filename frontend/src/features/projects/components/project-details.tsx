import {
  Alert,
  Autocomplete,
  Button,
  Card,
  CardContent,
  Chip,
  Stack,
  TextField,
  Typography,
} from '@mui/material';
import { CODE_BASIS_LABELS, type ProjectDto, type ProjectMemberDto } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import { useState } from 'react';
import { canOn, useAppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import { useDesigners, useUpdateProject } from '../api/projects';
import { ProjectFields } from './project-form';
import { projectSchema, type ProjectFormValues } from './project-schema';

function Members({ project, editable }: { project: ProjectDto; editable: boolean }) {
  const designers = useDesigners(editable);
  const update = useUpdateProject(project.id);
  const [chosen, setChosen] = useState<ProjectMemberDto[]>(project.members);
  const changed =
    chosen
      .map((m) => m.id)
      .sort()
      .join() !== project.memberIds.slice().sort().join();
  if (!editable) {
    return (
      <Stack direction="row" spacing={1} sx={{ flexWrap: 'wrap' }}>
        {project.members.map((m) => (
          <Chip key={m.id} label={m.name} />
        ))}
      </Stack>
    );
  }
  return (
    <Stack spacing={1}>
      <Autocomplete
        multiple
        options={designers.data ?? project.members}
        value={chosen}
        isOptionEqualToValue={(a, b) => a.id === b.id}
        getOptionLabel={(m) => m.name}
        onChange={(_, value) => setChosen(value)}
        renderInput={(params) => (
          <TextField {...params} label="Designers who may edit" helperText="You stay a member" />
        )}
      />
      {update.isError && <Alert severity="error">{errorMessages(update.error).join(' ')}</Alert>}
      <div>
        <Button
          variant="outlined"
          disabled={!changed || update.isPending}
          onClick={() =>
            update.mutate({ version: project.version, memberIds: chosen.map((m) => m.id) })
          }
        >
          Save the members
        </Button>
      </div>
    </Stack>
  );
}

/** A project's name, site, code basis and system, and its designers; members edit them. */
export function ProjectDetails({ project }: { project: ProjectDto }) {
  const ability = useAppAbility();
  const editable = canOn(ability, 'update', 'Project', {
    id: project.id,
    memberIds: project.memberIds,
  });
  const update = useUpdateProject(project.id);
  const form = useFormik<ProjectFormValues>({
    initialValues: {
      name: project.name,
      site: project.site ?? '',
      codeBasis: project.codeBasis,
      structuralSystem: project.structuralSystem ?? '',
    },
    enableReinitialize: true,
    validationSchema: projectSchema,
    onSubmit: async (values) => {
      await update
        .mutateAsync({
          version: project.version,
          name: values.name.trim(),
          site: values.site.trim() || null,
          codeBasis: values.codeBasis,
          structuralSystem: values.structuralSystem.trim() || null,
        })
        .catch(() => undefined);
    },
  });
  return (
    <Card variant="outlined" component="section" aria-label="Project">
      <CardContent>
        {editable ? (
          <Stack component="form" spacing={2} onSubmit={form.handleSubmit} noValidate>
            <ProjectFields form={form} />
            {update.isError && (
              <Alert severity="error">{errorMessages(update.error).join(' ')}</Alert>
            )}
            <div>
              <Button type="submit" variant="outlined" disabled={!form.dirty || form.isSubmitting}>
                Save the project
              </Button>
            </div>
          </Stack>
        ) : (
          <Stack spacing={0.5}>
            <Typography>{project.site ?? 'No site description.'}</Typography>
            <Typography color="text.secondary">
              {CODE_BASIS_LABELS[project.codeBasis]}
              {project.structuralSystem ? ` · ${project.structuralSystem}` : ''}
            </Typography>
          </Stack>
        )}
        <Typography variant="h3" sx={{ mt: 3, mb: 1 }}>
          Designers
        </Typography>
        <Members key={project.version} project={project} editable={editable} />
      </CardContent>
    </Card>
  );
}
