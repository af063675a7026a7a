import { applyMigrations } from './migrate';

// `npm run db:migrate` against DATABASE_URL (npm start migrates by itself).
const url = process.env.DATABASE_URL;
if (!url) {
  console.error('DATABASE_URL is not set; npm start migrates its local database by itself.');
  process.exit(1);
}
await applyMigrations(url);
console.log('Migrations applied.');
