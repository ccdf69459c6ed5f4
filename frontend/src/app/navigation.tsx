import FolderIcon from '@mui/icons-material/Folder';
import GroupIcon from '@mui/icons-material/Group';
import LocalLibraryIcon from '@mui/icons-material/LocalLibrary';
import MailIcon from '@mui/icons-material/Mail';
import HomeIcon from '@mui/icons-material/Home';
import StackedLineChartIcon from '@mui/icons-material/StackedLineChart';
import VerifiedIcon from '@mui/icons-material/Verified';
import type { Action, Subject } from '@tiermode/shared-types';
import type { NavEntry } from '@/components/layouts/app-shell';
import type { AppAbility } from '@/lib/ability';

interface GuardedEntry extends NavEntry {
  /** Shown only to users whose ability allows this; omitted means every signed-in user. */
  requires?: [Action, Subject];
}

/** Every page of the app; each feature that adds a page adds its entry here. */
const ENTRIES: GuardedEntry[] = [
  { label: 'Start', to: '/', icon: <HomeIcon /> },
  { label: 'Projects', to: '/projects', icon: <FolderIcon />, requires: ['read', 'Project'] },
  { label: 'Library', to: '/library', icon: <LocalLibraryIcon />, requires: ['read', 'Library'] },
  {
    label: 'Quick analysis',
    to: '/analysis',
    icon: <StackedLineChartIcon />,
    requires: ['create', 'Analysis'],
  },
  {
    label: 'Verification',
    to: '/verification',
    icon: <VerifiedIcon />,
    requires: ['read', 'Verification'],
  },
  { label: 'People', to: '/users', icon: <GroupIcon />, requires: ['manage', 'User'] },
  { label: 'Outbox', to: '/outbox', icon: <MailIcon />, requires: ['read', 'Outbox'] },
];

export function navigationFor(ability: AppAbility): NavEntry[] {
  return ENTRIES.filter((e) => !e.requires || ability.can(...e.requires)).map(
    ({ label, to, icon }) => ({ label, to, icon }),
  );
}
