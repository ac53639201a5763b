// Metro bundles only the client (app/, src/, shared/, fonts/). Server, test and
// data folders are blocked so a client import of server code fails the build.
const path = require('path');
const http = require('http');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);

const escape = (p) => p.replace(/[/\\^$*+?.()|[\]{}]/g, '\\$&');
const blocked = ['server', 'test', 'data', 'dist', '.test-data', 'scripts', 'bench'].map(
  (dir) => new RegExp('^' + escape(path.join(__dirname, dir)) + '(/.*)?$'),
);
// Side folders of an export in progress (server/web/build-web.ts).
blocked.push(new RegExp('^' + escape(path.join(__dirname, '.web-build-')) + '.*$'));
const existing = config.resolver.blockList;
config.resolver.blockList = [
  ...(Array.isArray(existing) ? existing : existing ? [existing] : []),
  ...blocked,
];

// Under `expo start --web`, relative /api calls reach Metro; forward them to Express.
const apiPort = Number(process.env.PORT || 8080);
config.server = config.server || {};
const previous = config.server.enhanceMiddleware;
config.server.enhanceMiddleware = (middleware, server) => {
  const base = previous ? previous(middleware, server) : middleware;
  return (req, res, next) => {
    if (!req.url || !req.url.startsWith('/api/')) return base(req, res, next);
    const upstream = http.request(
      { host: '127.0.0.1', port: apiPort, path: req.url, method: req.method, headers: req.headers },
      (reply) => {
        res.writeHead(reply.statusCode || 502, reply.headers);
        reply.pipe(res);
      },
    );
    upstream.on('error', () => {
      res.statusCode = 502;
      res.end(JSON.stringify({ error: { code: 'api_unreachable', message: 'The API server is not running.' } }));
    });
    req.pipe(upstream);
  };
};

module.exports = config;
