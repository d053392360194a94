# Photon Ledger web client: built with Vite, served by nginx, /api proxied to the API service.
# Build context: the repository root, e.g.
#   docker build -f docker/web.Dockerfile -t photon-ledger-web .
# Needs BuildKit (the default since Docker 23) for the cache mount and for
# docker/web.Dockerfile.dockerignore, which keeps node_modules, dist and .git out of the context.

FROM node:20-bookworm-slim AS build

RUN npm i -g pnpm@12.4.2
ENV npm_config_update_notifier=false

WORKDIR /app

COPY package.json pnpm-workspace.yaml pnpm-lock.yaml ./
COPY apps/api/package.json apps/api/
COPY apps/web/package.json apps/web/
COPY packages/shared/package.json packages/shared/
COPY packages/srp-core/package.json packages/srp-core/
COPY fixtures/package.json fixtures/
RUN --mount=type=cache,id=photon-ledger-pnpm-store,target=/pnpm/store \
    pnpm install --frozen-lockfile --filter @photon-ledger/web... --store-dir /pnpm/store

COPY tsconfig.base.json ./
COPY packages/shared packages/shared
COPY packages/srp-core packages/srp-core
COPY fixtures fixtures
COPY apps/web apps/web
RUN pnpm --filter @photon-ledger/web build


FROM nginx:1.27-alpine

# The image renders /etc/nginx/templates/*.template into /etc/nginx/conf.d/ at start-up,
# substituting only the variables the filter allows (nginx's own $uri etc. stay untouched).
ENV NGINX_ENVSUBST_FILTER=^PL_ \
    PL_API_UPSTREAM=api:8787 \
    PL_DNS_RESOLVER=127.0.0.11
COPY docker/nginx/default.conf.template /etc/nginx/templates/default.conf.template
COPY --from=build /app/apps/web/dist /usr/share/nginx/html

EXPOSE 8080
