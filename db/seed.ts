/**
 * The demo scenario (invented names only): one coil shop's team with one user per role, two projects and three
 * coils built from the engine's starting points. Runs only into a database with no users.
 */
import { randomUUID } from 'node:crypto';
import type { Database } from '@/db/client';
import { countUsers } from '@/db/queries/users';
import { coils, memberships, projects, teams, users, type CoilSummary, type Role } from '@/db/schema';
import { startingPointDocument } from '@/lib/engine/starting-points';
import type { CoilDocument } from '@/lib/engine/types';

export const DEMO_PASSWORD = 'tubeloom-demo-2026';
export const DEMO_TEAM = 'Harrowgate Coil Works';
export const DEMO_USERS: { email: string; name: string; role: Role }[] = [
  { email: 'ada.marsh@harrowgate.example', name: 'Ada Marsh', role: 'owner' },
  { email: 'ben.okafor@harrowgate.example', name: 'Ben Okafor', role: 'designer' },
  { email: 'carla.nunes@harrowgate.example', name: 'Carla Nunes', role: 'reviewer' },
  { email: 'dev.patel@harrowgate.example', name: 'Dev Patel', role: 'viewer' },
];

interface DemoProject {
  name: string;
  client: string;
  site: string;
  notes: string;
  coils: CoilDocument[];
}

function demoProjects(): DemoProject[] {
  return [
    {
      name: 'Riverside Clinic AHU retrofit',
      client: 'Northfold Health Trust',
      site: 'Riverside Clinic, plant room B',
      notes: 'Replacement coils for AHU-2; keep the existing casing opening and the header connections on the left.',
      coils: [
        startingPointDocument('half-inch', { name: 'AHU-2 chilled-water coil', rows: 4, tubesPerRow: 20, mode: 'cooling' }),
        startingPointDocument('half-inch', { name: 'AHU-2 heating coil', rows: 2, tubesPerRow: 20, mode: 'heating' }),
      ],
    },
    {
      name: 'Kestrel Street offices',
      client: 'Kestrel Street Partners',
      site: '14 Kestrel Street, roof plant',
      notes: 'Tenant fit-out, floors 2 to 5. Pressure-drop budget 40 kPa per coil.',
      coils: [
        startingPointDocument('five-eighths-inch', { name: 'Roof AHU cooling coil', rows: 6, tubesPerRow: 16, mode: 'cooling' }),
      ],
    },
  ];
}

export interface SeedOptions {
  passwordHash: string;
  /** The list numbers of a coil (the server computes them with the solver). */
  summarize: (document: CoilDocument) => CoilSummary | null;
}

/** Returns false (and changes nothing) when the database already has users. */
export async function seedDemo(db: Database, options: SeedOptions): Promise<boolean> {
  if ((await countUsers(db)) > 0) return false;
  await db.transaction(async (tx) => {
    const [team] = await tx.insert(teams).values({ name: DEMO_TEAM }).returning();
    const ids = new Map<Role, string>();
    for (const u of DEMO_USERS) {
      const id = randomUUID();
      ids.set(u.role, id);
      await tx.insert(users).values({ id, email: u.email, name: u.name, passwordHash: options.passwordHash });
      await tx.insert(memberships).values({ teamId: team.id, userId: id, role: u.role });
    }
    const owner = ids.get('owner');
    const designer = ids.get('designer');
    for (const p of demoProjects()) {
      const [project] = await tx
        .insert(projects)
        .values({ teamId: team.id, name: p.name, client: p.client, site: p.site, notes: p.notes, createdBy: owner, updatedBy: designer })
        .returning();
      for (const document of p.coils) {
        await tx.insert(coils).values({
          projectId: project.id,
          name: document.name,
          document,
          summary: options.summarize(document),
          createdBy: designer,
          updatedBy: designer,
        });
      }
    }
  });
  return true;
}
