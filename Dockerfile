# Production-like image: the API serving the built web app. Secrets and endpoints come from the
# environment (see docker-compose.yml and the README's table); nothing defaults to the local fakes.

FROM node:20-bookworm-slim AS build
WORKDIR /app
COPY package.json package-lock.json ./
RUN npm ci --no-audit --no-fund
COPY . .
RUN npx vite build --config web/vite.config.ts

FROM node:20-bookworm-slim
# ffmpeg makes posters and sprites of uploaded recordings.
RUN apt-get update \
  && DEBIAN_FRONTEND=noninteractive apt-get install -y --no-install-recommends ffmpeg ca-certificates \
  && rm -rf /var/lib/apt/lists/*
WORKDIR /app
ENV NODE_ENV=production \
    HOST=0.0.0.0 \
    PORT=4310 \
    WEB_DIST=/app/web/dist \
    AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED=true
COPY package.json package-lock.json ./
RUN npm ci --omit=dev --no-audit --no-fund && npm cache clean --force
COPY tsconfig.json tsconfig.base.json ./
COPY core ./core
COPY api ./api
COPY migrations ./migrations
COPY scripts ./scripts
COPY --from=build /app/web/dist ./web/dist
USER node
EXPOSE 4310
HEALTHCHECK --interval=30s --timeout=5s --start-period=20s \
  CMD node -e "fetch('http://127.0.0.1:'+process.env.PORT+'/api/health').then(r=>process.exit(r.ok?0:1),()=>process.exit(1))"
CMD ["npx", "tsx", "api/src/server.ts"]
