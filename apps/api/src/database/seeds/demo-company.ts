import { EntityManager } from 'typeorm';
import { hashPassword } from '../../auth/password';
import type { Role } from '../../common/roles';

/** The invented demo scenario: a small GRP flat-roofing firm in an invented town. */
export const DEMO_COMPANY = {
  name: 'Tamsin Vale Roofing Ltd',
  email: 'office@tamsinvale.test',
  phone: '01632 960 412',
  address: 'Unit 4, Coppice Yard, Elmbridge Lane, Hollowmere HM4 2QT',
  vatNumber: 'GB000 1234 56',
};

export const DEMO_PASSWORD = 'potlife-demo';

export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'owner@demo.test', name: 'Marta Quill', role: 'owner' },
  { email: 'estimator@demo.test', name: 'Dev Okafor', role: 'estimator' },
  { email: 'storeman@demo.test', name: 'Rhys Calloway', role: 'storeman' },
];

export interface SeedContext {
  companyId: string;
  userIds: Record<Role, string>;
}

/** Creates the company and its three users once; later runs find them and change nothing. */
export async function seedDemoCompany(m: EntityManager): Promise<SeedContext> {
  const existing: { company_id: string }[] = await m.query(`SELECT company_id FROM users WHERE lower(email) = $1`, [
    DEMO_USERS[0]!.email,
  ]);
  let companyId = existing[0]?.company_id;
  if (!companyId) {
    const [row] = (await m.query(
      `INSERT INTO companies (name, email, phone, address, vat_number) VALUES ($1, $2, $3, $4, $5) RETURNING id`,
      [DEMO_COMPANY.name, DEMO_COMPANY.email, DEMO_COMPANY.phone, DEMO_COMPANY.address, DEMO_COMPANY.vatNumber],
    )) as [{ id: string }];
    companyId = row.id;
  }
  const userIds = {} as Record<Role, string>;
  for (const u of DEMO_USERS) {
    const found: { id: string }[] = await m.query(`SELECT id FROM users WHERE lower(email) = $1`, [u.email]);
    if (found[0]) {
      userIds[u.role] = found[0].id;
      continue;
    }
    const [row] = (await m.query(
      `INSERT INTO users (company_id, email, name, role, password_hash, active) VALUES ($1, $2, $3, $4, $5, true) RETURNING id`,
      [companyId, u.email, u.name, u.role, await hashPassword(DEMO_PASSWORD)],
    )) as [{ id: string }];
    userIds[u.role] = row.id;
  }
  return { companyId, userIds };
}
