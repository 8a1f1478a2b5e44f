import { applyMigrations } from "../db/migrate";
import { seedDemo } from "../db/seed";

await applyMigrations();
const { created } = await seedDemo();
console.log(created ? "Demo data added." : "Demo data already present; nothing changed.");
