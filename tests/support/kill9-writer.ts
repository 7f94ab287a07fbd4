// Child process for the durability test: opens the embedded database like the app does (with the
// lock) and inserts rows one by one, printing each id only after its insert is acknowledged.
import { PGlite } from "@electric-sql/pglite";
import { acquireDataDirLock } from "../../db/lock";

const dataDir = process.argv[2]!;
acquireDataDirLock(dataDir);
const db = await PGlite.create({ dataDir });
await db.exec("create table if not exists acks (id integer primary key)");
for (let id = 1; ; id++) {
  await db.query("insert into acks (id) values ($1)", [id]);
  process.stdout.write(`ack ${id}\n`);
}
