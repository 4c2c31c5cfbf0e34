import type { QueryInterface } from 'sequelize';
import * as m0001 from './0001-foundation';
import * as m0002 from './0002-bay-files';
import * as m0003 from './0003-password-resets';
import * as m0004 from './0004-shop-margins';
import * as m0006 from './0006-hardening';
import * as m0005 from './0005-ground-firmness';
import * as m0007 from './0007-bags-spec-sheets';
import * as m0008 from './0008-fitting-revision';
import * as m0009 from './0009-shops-invitations';
import * as m0010 from './0010-remote-fitting';

type Step = (params: { context: QueryInterface }) => Promise<void>;

/** Every migration in order. Add new ones at the end; never edit one that has shipped. */
export const migrations: { name: string; up: Step; down: Step }[] = [
  { name: '0001-foundation', ...m0001 },
  { name: '0002-bay-files', ...m0002 },
  { name: '0003-password-resets', ...m0003 },
  { name: '0004-shop-margins', ...m0004 },
  { name: '0005-ground-firmness', ...m0005 },
  { name: '0006-hardening', ...m0006 },
  { name: '0007-bags-spec-sheets', ...m0007 },
  { name: '0008-fitting-revision', ...m0008 },
  { name: '0009-shops-invitations', ...m0009 },
  { name: '0010-remote-fitting', ...m0010 },
];
