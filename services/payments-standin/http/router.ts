export interface Route<H> {
  method: "GET" | "POST";
  pattern: string;
  handler: H;
}

interface Compiled<H> extends Route<H> {
  regex: RegExp;
  names: string[];
}

export interface Match<H> {
  handler: H;
  params: Record<string, string>;
}

/** Matches paths such as `/v1/transfers/:id/reversals`; a segment parameter never spans a slash. */
export class Router<H> {
  private readonly routes: Compiled<H>[];

  constructor(routes: Route<H>[]) {
    this.routes = routes.map((route) => {
      const names: string[] = [];
      const source = route.pattern
        .split("/")
        .map((segment) => {
          if (!segment.startsWith(":")) return segment.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
          names.push(segment.slice(1));
          return "([^/]+)";
        })
        .join("/");
      return { ...route, names, regex: new RegExp(`^${source}$`) };
    });
  }

  match(method: string, path: string): Match<H> | undefined {
    for (const route of this.routes) {
      if (route.method !== method) continue;
      const found = route.regex.exec(path);
      if (!found) continue;
      const params: Record<string, string> = {};
      route.names.forEach((name, i) => (params[name] = decodeURIComponent(found[i + 1] ?? "")));
      return { handler: route.handler, params };
    }
    return undefined;
  }
}
