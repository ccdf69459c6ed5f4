import { CODE_BASES, type CodeBasis } from '@tiermode/shared-types';
import * as yup from 'yup';

export interface ProjectFormValues {
  name: string;
  site: string;
  codeBasis: CodeBasis;
  structuralSystem: string;
}

export const projectSchema = yup.object({
  name: yup.string().trim().required('Give the project a name').max(200, 'At most 200 characters'),
  site: yup.string().max(1000, 'At most 1000 characters'),
  codeBasis: yup.string().oneOf(CODE_BASES),
  structuralSystem: yup.string().max(120, 'At most 120 characters'),
});
