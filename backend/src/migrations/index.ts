import type { MigrationObject } from '@mikro-orm/core';
import { Migration20261201215434 } from './Migration20261201215434';
import { Migration20261201231437 } from './Migration20261201231437';
import { Migration20261201231817 } from './Migration20261201231817';
import { Migration20261201232131 } from './Migration20261201232131';
import { Migration20261201233354 } from './Migration20261201233354';
import { Migration20261201233733 } from './Migration20261201233733';
import { Migration20261201235500 } from './Migration20261201235500';
import { Migration20261202000500 } from './Migration20261202000500';
import { Migration20261202004852 } from './Migration20261202004852';
import { Migration20261202012253 } from './Migration20261202012253';
import { Migration20261202015831 } from './Migration20261202015831';
import { Migration20261202022030 } from './Migration20261202022030';
import { Migration20261203073309 } from './Migration20261203073309';
import { Migration20261203074322 } from './Migration20261203074322';
import { Migration20261203143328 } from './Migration20261203143328';
import { Migration20261203171500 } from './Migration20261203171500';
import { Migration20261205193352 } from './Migration20261205193352';

/** Every committed migration, oldest first. Add each new one here (see DEVELOPERS.md). */
export const MIGRATIONS: MigrationObject[] = [
  { name: 'Migration20261201215434', class: Migration20261201215434 },
  { name: 'Migration20261201231437', class: Migration20261201231437 },
  { name: 'Migration20261201231817', class: Migration20261201231817 },
  { name: 'Migration20261201232131', class: Migration20261201232131 },
  { name: 'Migration20261201233354', class: Migration20261201233354 },
  { name: 'Migration20261201233733', class: Migration20261201233733 },
  { name: 'Migration20261201235500', class: Migration20261201235500 },
  { name: 'Migration20261202000500', class: Migration20261202000500 },
  { name: 'Migration20261202004852', class: Migration20261202004852 },
  { name: 'Migration20261202012253', class: Migration20261202012253 },
  { name: 'Migration20261202015831', class: Migration20261202015831 },
  { name: 'Migration20261202022030', class: Migration20261202022030 },
  { name: 'Migration20261203073309', class: Migration20261203073309 },
  { name: 'Migration20261203074322', class: Migration20261203074322 },
  { name: 'Migration20261203143328', class: Migration20261203143328 },
  { name: 'Migration20261203171500', class: Migration20261203171500 },
  { name: 'Migration20261205193352', class: Migration20261205193352 },
];
