# Photon Ledger API and job worker (one image; PL_ROLE picks the process, see entrypoint.sh).
# Build context: the repository root, e.g.
#   docker build -f docker/api.Dockerfile -t photon-ledger-api .
# Needs BuildKit (the default since Docker 23) for the cache mount and for
# docker/api.Dockerfile.dockerignore, which keeps node_modules, dist and .git out of the context.
FROM node:20-bookworm-slim

# pnpm pinned to the repository's packageManager; corepack cannot verify signatures here.
RUN npm i -g pnpm@12.4.2
ENV npm_config_update_notifier=false

WORKDIR /app

# Manifests first, so the dependency layer is rebuilt only when they change.
COPY package.json pnpm-workspace.yaml pnpm-lock.yaml ./
COPY apps/api/package.json apps/api/
COPY apps/web/package.json apps/web/
COPY packages/shared/package.json packages/shared/
COPY packages/srp-core/package.json packages/srp-core/
COPY fixtures/package.json fixtures/
RUN --mount=type=cache,id=photon-ledger-pnpm-store,target=/pnpm/store \
    pnpm install --frozen-lockfile --filter @photon-ledger/api... --store-dir /pnpm/store

# Sources: the API runs its TypeScript through tsx, so there is no build step.
COPY tsconfig.base.json ./
COPY packages/shared packages/shared
COPY packages/srp-core packages/srp-core
COPY fixtures fixtures
COPY apps/api apps/api
COPY docker/entrypoint.sh /usr/local/bin/photon-ledger-entrypoint

ENV NODE_ENV=production \
    PL_ROLE=api \
    PL_HOST=0.0.0.0 \
    PL_PORT=8787

# The code stays owned by root and read-only to the process; `node` (uid 1000) comes with the image.
USER node
EXPOSE 8787

# No arguments: PL_ROLE=api runs `pnpm --filter @photon-ledger/api exec tsx src/server.ts`,
# worker runs src/worker.ts, migrate runs src/cli/migrate.ts then src/cli/seed.ts.
ENTRYPOINT ["/bin/sh", "/usr/local/bin/photon-ledger-entrypoint"]
