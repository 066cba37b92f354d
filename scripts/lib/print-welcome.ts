import { ROLE_LABELS } from '@shared/constants/roles';
import { DEMO_CLUBS, DEMO_PASSWORD, DEMO_PEOPLE } from '../../server/db/seeds/demo-people';

const url = `http://127.0.0.1:${process.env.PORT ?? 3000}`;
const clubName = (slug: string) => DEMO_CLUBS.find((c) => c.slug === slug)?.name ?? slug;
console.log(`\n  Shoalwise is starting at ${url}   (Ctrl-C stops it)\n`);
console.log(`  Demo sign-ins (password for all: ${DEMO_PASSWORD}):`);
for (const p of DEMO_PEOPLE) {
  const roles = Object.entries(p.roles)
    .map(([slug, role]) => `${ROLE_LABELS[role]} of ${clubName(slug)}`)
    .join('; ');
  console.log(`    ${p.email.padEnd(30)} ${roles}`);
}
console.log(`\n  Captured e-mails: ${url}/dev/outbox\n`);
