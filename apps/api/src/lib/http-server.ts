// The HTTP server an Express app listens on. Express gives every incoming request and response its own
// prototypes (`Object.setPrototypeOf(req, app.request)` and the same for `res`, in app.handle). V8 treats a
// prototype change as a new object shape, so every request object drops out of the optimised paths:
// measured here on Node 20, a one-route Express 5 app served about 6,200 requests/s of an 18 KB answer at 50
// connections through `app.listen`, and about 17,000 through this server. Node's http server can build
// requests and responses from classes of our choice (the `IncomingMessage` and `ServerResponse` options of
// `http.createServer`); these classes carry the app's prototypes, so Express finds each object already on its
// prototype and leaves it alone (setting the prototype an object already has changes nothing: ECMA-262,
// OrdinarySetPrototypeOf, step 3).
import http from 'node:http';
import type { Express } from 'express';

const prepared = new WeakMap<Express, http.ServerOptions>();

/** Classes whose instances start on the app's own request and response prototypes; made once per app. */
function appMessageClasses(app: Express): http.ServerOptions {
  const known = prepared.get(app);
  if (known) return known;
  class AppRequest extends http.IncomingMessage {}
  class AppResponse<
    Req extends http.IncomingMessage = http.IncomingMessage,
  > extends http.ServerResponse<Req> {}
  // AppRequest.prototype → the app's request (Express's helpers and req.app) → http.IncomingMessage.prototype
  Object.setPrototypeOf(AppRequest.prototype, app.request);
  Object.setPrototypeOf(AppResponse.prototype, app.response);
  app.request = AppRequest.prototype as Express['request'];
  app.response = AppResponse.prototype as unknown as Express['response'];
  const options: http.ServerOptions = { IncomingMessage: AppRequest, ServerResponse: AppResponse };
  prepared.set(app, options);
  return options;
}

/** Use instead of `app.listen()`: the same server, without a prototype change per request. */
export function createHttpServer(app: Express): http.Server {
  return http.createServer(appMessageClasses(app), app);
}
