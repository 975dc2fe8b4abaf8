#!/usr/bin/env node
// The project's private PostgreSQL cluster. Usage: node scripts/db.mjs <command>
//   start            start (creating on first use) the cluster on 127.0.0.1:$MOORING_PG_PORT (54329)
//   stop             stop it
//   status           print state, port, data directory and URL (exit 3 when stopped)
//   createdb <name>  create a database owned by role mooring (no-op if it exists)
//   dropdb <name>    drop a database (no-op if missing)
//   url [name]       print the connection URL (default database: mooring)
import {
  DbError,
  clusterState,
  createDatabase,
  databaseUrl,
  dropDatabase,
  start,
  stop,
} from "./lib/postgres.mjs";

const usage = "usage: node scripts/db.mjs start | stop | status | createdb <name> | dropdb <name> | url [name]";

async function main(argv) {
  const [command, name] = argv;
  switch (command) {
    case "start": {
      const { port, started, pgdata } = await start();
      console.log(`PostgreSQL ${started ? "started" : "already running"} on 127.0.0.1:${port} (data: ${pgdata})`);
      console.log(databaseUrl("mooring", port));
      return 0;
    }
    case "stop": {
      console.log(stop() ? "PostgreSQL stopped" : "PostgreSQL was not running");
      return 0;
    }
    case "status": {
      const s = clusterState();
      if (s.running) {
        console.log(`running: pid ${s.pid}, 127.0.0.1:${s.port}, data ${s.pgdata}`);
        console.log(databaseUrl("mooring", s.port));
        return 0;
      }
      console.log(`stopped (data ${s.pgdata}); start with: npm run db:start`);
      return 3;
    }
    case "createdb": {
      const { port } = await start();
      const created = createDatabase(name, { port });
      console.log(`${created ? "created" : "exists"}: ${databaseUrl(name, port)}`);
      return 0;
    }
    case "dropdb": {
      const { port } = await start();
      dropDatabase(name, { port });
      console.log(`dropped ${name}`);
      return 0;
    }
    case "url": {
      console.log(databaseUrl(name ?? "mooring"));
      return 0;
    }
    default:
      console.error(usage);
      return 2;
  }
}

main(process.argv.slice(2)).then(
  (code) => process.exit(code),
  (error) => {
    if (error instanceof DbError) {
      console.error(`db: ${error.message}`);
      process.exit(1);
    }
    throw error;
  },
);
