import AddIcon from '@mui/icons-material/Add';
import { Button, LinearProgress, Stack, Typography } from '@mui/material';
import { useState } from 'react';
import { useNavigate, useParams } from 'react-router';
import { RequestFailed } from '@/components/errors/request-failed';
import { STARTING_INPUTS } from '@/features/analysis/model/starting-inputs';
import { CalculationList } from '@/features/calculations/components/calculation-list';
import { ImportCalculationButton } from '@/features/calculations/components/import-calculation-button';
import { NewCalculationDialog } from '@/features/calculations/components/new-calculation-dialog';
import { useProject } from '@/features/projects/api/projects';
import { ProjectDetails } from '@/features/projects/components/project-details';
import { canOn, useAppAbility } from '@/lib/ability';

/** One project: its details and designers, and its calcs with their status. */
export function ProjectRoute() {
  const { id = '' } = useParams();
  const project = useProject(id);
  const ability = useAppAbility();
  const navigate = useNavigate();
  const [creating, setCreating] = useState(false);
  if (project.isError) return <RequestFailed error={project.error} />;
  if (!project.data) return <LinearProgress aria-label="Loading the project" />;
  const canCreate = canOn(ability, 'create', 'Calculation', {
    projectMemberIds: project.data.memberIds,
  });
  return (
    <Stack spacing={2}>
      <Typography variant="h1">{project.data.name}</Typography>
      <ProjectDetails project={project.data} />
      <Stack direction="row" sx={{ justifyContent: 'space-between', alignItems: 'center' }}>
        <Typography variant="h2">Calculations</Typography>
        {canCreate && (
          <Stack direction="row" spacing={1} sx={{ alignItems: 'flex-start' }}>
            <ImportCalculationButton
              projectId={id}
              onImported={(calc) => void navigate(`/calculations/${calc.id}`)}
            />
            <Button variant="contained" startIcon={<AddIcon />} onClick={() => setCreating(true)}>
              New calculation
            </Button>
          </Stack>
        )}
      </Stack>
      <CalculationList
        query={{ projectId: id }}
        label="Calculations of the project"
        hideProject
        empty="No calculations in this project yet"
      />
      {creating && (
        <NewCalculationDialog
          projectId={id}
          inputs={STARTING_INPUTS}
          onClose={() => setCreating(false)}
          onCreated={(calc) => void navigate(`/calculations/${calc.id}`)}
        />
      )}
    </Stack>
  );
}
