import { VerificationPage } from '@/features/verification/components/verification-page';

export function VerificationRoute() {
  return <VerificationPage />;
}
