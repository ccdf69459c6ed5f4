import { LibraryPage } from '@/features/library/components/library-page';

export function LibraryRoute() {
  return <LibraryPage />;
}
