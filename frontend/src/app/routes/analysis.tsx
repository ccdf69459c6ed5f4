import SaveIcon from '@mui/icons-material/Save';
import { Button } from '@mui/material';
import type { AnalysisRequest } from '@tiermode/shared-types';
import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Forbidden } from '@/components/errors/forbidden';
import { AnalysisPage } from '@/features/analysis/components/analysis-page';
import { NewCalculationDialog } from '@/features/calculations/components/new-calculation-dialog';
import { useProjects } from '@/features/projects/api/projects';
import { useAppAbility } from '@/lib/ability';
import type { UnitSystem } from '@/lib/units';

/** The quick analysis, with "Save as a calc" for whoever may create calcs. */
export function AnalysisRoute() {
  const ability = useAppAbility();
  if (!ability.can('create', 'Analysis')) return <Forbidden />;
  return (
    <AnalysisPage
      saveAction={
        ability.can('create', 'Calculation')
          ? (request, units) => <SaveAsCalc request={request} units={units} />
          : undefined
      }
    />
  );
}

/** Saves what the quick analysis shows as a new draft in a project the designer belongs to. */
function SaveAsCalc({ request, units }: { request: AnalysisRequest | null; units: UnitSystem }) {
  const [open, setOpen] = useState(false);
  const navigate = useNavigate();
  const projects = useProjects();
  return (
    <>
      <Button
        variant="outlined"
        startIcon={<SaveIcon />}
        disabled={request === null}
        onClick={() => setOpen(true)}
      >
        Save as a calc
      </Button>
      {open && request && (
        <NewCalculationDialog
          projects={projects.data ?? []}
          inputs={request}
          displayUnits={units}
          intro="The calc starts as a draft with the storeys, spectrum and settings on this page, in the project you choose."
          onClose={() => setOpen(false)}
          onCreated={(calc) => void navigate(`/calculations/${calc.id}`)}
        />
      )}
    </>
  );
}
