import AddIcon from '@mui/icons-material/Add';
import {
  Alert,
  Box,
  Button,
  Dialog,
  DialogActions,
  DialogContent,
  DialogTitle,
  Link,
  Stack,
  Typography,
} from '@mui/material';
import { DataGrid, type GridColDef } from '@mui/x-data-grid';
import { CODE_BASIS_LABELS, formatDate, type ProjectDto } from '@tiermode/shared-types';
import { useFormik } from 'formik';
import { useState } from 'react';
import { Link as RouterLink, useNavigate } from 'react-router';
import { useAppAbility } from '@/lib/ability';
import { errorMessages } from '@/lib/api-client';
import { useCreateProject, useProjects } from '../api/projects';
import { ProjectFields } from './project-form';
import { projectSchema, type ProjectFormValues } from './project-schema';

const columns: GridColDef<ProjectDto>[] = [
  {
    field: 'name',
    headerName: 'Project',
    flex: 2,
    minWidth: 220,
    renderCell: ({ row }) => (
      <Link component={RouterLink} to={`/projects/${row.id}`}>
        {row.name}
      </Link>
    ),
  },
  {
    field: 'codeBasis',
    headerName: 'Code basis',
    width: 160,
    valueFormatter: (value: ProjectDto['codeBasis']) => CODE_BASIS_LABELS[value],
  },
  { field: 'structuralSystem', headerName: 'Structural system', flex: 1, minWidth: 180 },
  {
    field: 'members',
    headerName: 'Designers',
    flex: 1,
    minWidth: 180,
    valueGetter: (_v, row) => row.members.map((m) => m.name).join(', '),
  },
  {
    field: 'updatedAt',
    headerName: 'Last change',
    width: 130,
    valueFormatter: (value: string) => formatDate(value),
  },
];

function CreateProjectDialog({ onClose }: { onClose: () => void }) {
  const create = useCreateProject();
  const navigate = useNavigate();
  const form = useFormik<ProjectFormValues>({
    initialValues: { name: '', site: '', codeBasis: 'ASCE7-22', structuralSystem: '' },
    validationSchema: projectSchema,
    onSubmit: async (values) => {
      const project = await create
        .mutateAsync({
          name: values.name.trim(),
          codeBasis: values.codeBasis,
          ...(values.site.trim() ? { site: values.site.trim() } : {}),
          ...(values.structuralSystem.trim()
            ? { structuralSystem: values.structuralSystem.trim() }
            : {}),
        })
        .catch(() => null);
      if (project) void navigate(`/projects/${project.id}`);
    },
  });
  return (
    <Dialog open onClose={onClose} fullWidth maxWidth="sm" aria-labelledby="new-project-title">
      <form onSubmit={form.handleSubmit} noValidate>
        <DialogTitle id="new-project-title">New project</DialogTitle>
        <DialogContent>
          <Box sx={{ pt: 1 }}>
            <ProjectFields form={form} />
          </Box>
          {create.isError && (
            <Alert severity="error" sx={{ mt: 2 }}>
              {errorMessages(create.error).join(' ')}
            </Alert>
          )}
        </DialogContent>
        <DialogActions>
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="contained" disabled={form.isSubmitting}>
            Create the project
          </Button>
        </DialogActions>
      </form>
    </Dialog>
  );
}

/** Every project of the firm; designers create new ones and become their first member. */
export function ProjectsPage() {
  const projects = useProjects();
  const ability = useAppAbility();
  const [creating, setCreating] = useState(false);
  const rows = projects.data ?? [];
  return (
    <Stack spacing={2}>
      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center' }}>
        <Typography variant="h1">Projects</Typography>
        {ability.can('create', 'Project') && (
          <Button variant="contained" startIcon={<AddIcon />} onClick={() => setCreating(true)}>
            New project
          </Button>
        )}
      </Stack>
      {projects.isError && (
        <Alert severity="error">{errorMessages(projects.error).join(' ')}</Alert>
      )}
      <Box sx={{ height: Math.min(560, 160 + rows.length * 52) }}>
        <DataGrid
          aria-label="Projects"
          rows={rows}
          columns={columns}
          loading={projects.isPending}
          disableRowSelectionOnClick
          localeText={{ noRowsLabel: 'No projects yet' }}
        />
      </Box>
      {creating && <CreateProjectDialog onClose={() => setCreating(false)} />}
    </Stack>
  );
}
