#!/bin/sh
# Starts one Photon Ledger process in the API/worker image; PL_ROLE chooses which.
# Arguments, when given (`docker run IMAGE CMD...`), run instead of the role.
set -eu

if [ "$#" -gt 0 ]; then
  exec "$@"
fi

case "${PL_ROLE:-api}" in
  api)
    exec pnpm --filter @photon-ledger/api exec tsx src/server.ts
    ;;
  worker)
    exec pnpm --filter @photon-ledger/api exec tsx src/worker.ts
    ;;
  migrate)
    pnpm --filter @photon-ledger/api exec tsx src/cli/migrate.ts
    if [ "${PL_SEED_DEMO:-1}" = "1" ]; then
      exec pnpm --filter @photon-ledger/api exec tsx src/cli/seed.ts
    fi
    echo "PL_SEED_DEMO=${PL_SEED_DEMO}: demo data not seeded"
    ;;
  *)
    echo "PL_ROLE must be api, worker or migrate; got '${PL_ROLE}'" >&2
    exit 64
    ;;
esac
