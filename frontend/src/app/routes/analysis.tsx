import { Forbidden } from '@/components/errors/forbidden';
import { AnalysisPage } from '@/features/analysis/components/analysis-page';
import { useAppAbility } from '@/lib/ability';

export function AnalysisRoute() {
  return useAppAbility().can('create', 'Analysis') ? <AnalysisPage /> : <Forbidden />;
}
