// Import boundaries and circles, checked by `npm run lint` (scripts/lint.ts). The tree is one-way:
// shared/ is pure and imported by both sides; the server never reaches into the client; a client
// feature never imports another (compose them in src/app); a server feature's routes are its own.
/** @type {import('dependency-cruiser').IConfiguration} */
module.exports = {
  forbidden: [
    {
      name: 'no-circular',
      severity: 'error',
      comment: 'An import circle makes load order matter and hides the real layering.',
      from: {},
      to: { circular: true },
    },
    {
      name: 'shared-is-pure',
      severity: 'error',
      comment: 'shared/ is imported by the client and the server and imports neither, nor tests or scripts.',
      from: { path: '^shared/', pathNot: '[.]test[.]ts$' },
      to: { path: '^(src|server|tests|scripts|migrations)/' },
    },
    {
      name: 'shared-tests-use-no-app',
      severity: 'error',
      comment: "shared/'s own tests may read reference rooms under tests/, never the client or the server.",
      from: { path: '^shared/.+[.]test[.]ts$' },
      to: { path: '^(src|server|migrations)/' },
    },
    {
      name: 'server-never-imports-client',
      severity: 'error',
      from: { path: '^server/' },
      to: { path: '^src/' },
    },
    {
      name: 'client-features-apart',
      severity: 'error',
      comment: 'A client feature never imports another feature: compose features in src/app.',
      from: { path: '^src/features/([^/]+)/' },
      to: { path: '^src/features/([^/]+)/', pathNot: '^src/features/$1/' },
    },
    {
      name: 'server-routes-their-own',
      severity: 'error',
      comment: "Another feature's routes are never imported: use that feature's service or repository.",
      from: { path: '^server/features/([^/]+)/' },
      to: { path: '^server/features/([^/]+)/.+[.]routes[.]ts$', pathNot: '^server/features/$1/' },
    },
    {
      name: 'server-nothing-imports-the-app',
      severity: 'error',
      comment: 'createApp and the composition root are at the top: everything below is handed AppServices.',
      from: { path: '^server/(features|services|http|db)/' },
      to: { path: '^server/(app|compose|index)[.]ts$' },
    },
    {
      name: 'server-services-below-features',
      severity: 'error',
      comment: 'server/services/ are general parts (mail, storage, tokens…); features use them, never the reverse.',
      from: { path: '^server/services/' },
      to: { path: '^server/features/' },
    },
    {
      name: 'server-repositories-at-the-bottom',
      severity: 'error',
      comment: 'routes → services → repositories: a repository only runs queries.',
      from: { path: '^server/features/.+[.]repository[.]ts$' },
      to: { path: '^server/features/.+[.](service|routes)[.]ts$' },
    },
    {
      name: 'server-services-below-routes',
      severity: 'error',
      comment: 'routes → services → repositories: a service never reaches back up into routes.',
      from: { path: '^server/features/.+[.]service[.]ts$' },
      to: { path: '^server/features/.+[.]routes[.]ts$' },
    },
    {
      name: 'migrations-frozen',
      severity: 'error',
      comment: 'Migrations are frozen in time: they never import app code.',
      from: { path: '^migrations/' },
      to: { path: '^(src|server|shared)/' },
    },
  ],
  options: {
    doNotFollow: { path: 'node_modules' },
    exclude: { path: '^(node_modules|dist|data)/' },
    tsPreCompilationDeps: true,
    tsConfig: { fileName: 'tsconfig.json' },
    enhancedResolveOptions: { exportsFields: ['exports'], conditionNames: ['import', 'require', 'node', 'default', 'types'] },
  },
};
