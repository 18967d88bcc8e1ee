import type { INestApplication } from '@nestjs/common';
import { ROUTE_ARGS_METADATA } from '@nestjs/common/constants';
import { RouteParamtypes } from '@nestjs/common/enums/route-paramtypes.enum';
import { listRoutes, type RouteInfo } from './routes';

/** The zod schema a nestjs-zod DTO class carries; absent for plain types. */
interface SchemaNode {
  _zod: { def: { type: string; shape?: Record<string, unknown>; in?: SchemaNode; innerType?: SchemaNode } };
}

/** What a route reads from a request, taken from its handler's argument decorators and types. */
export interface CataloguedRoute extends RouteInfo {
  /** Top-level fields of the body's contract schema; empty when the body is not an object or not read. */
  bodyFields: string[];
  readsBody: boolean;
  /** Fields of the query's contract schema; undefined when the route reads no query. */
  queryFields: string[] | undefined;
  /** The route takes one uploaded file (multipart). */
  takesFile: boolean;
  /** `:param` names in the path, in order. */
  params: string[];
}

/** Unwraps optional, default and pipe layers down to an object schema and answers its keys. */
function fieldsOf(schema: SchemaNode | undefined): string[] {
  for (let node = schema, depth = 0; node && depth < 10; depth += 1) {
    const def = node._zod.def;
    if (def.type === 'object') return Object.keys(def.shape ?? {});
    node = def.type === 'pipe' ? def.in : def.innerType;
  }
  return [];
}

const schemaOf = (type: unknown): SchemaNode | undefined =>
  (type as { schema?: SchemaNode } | undefined)?.schema?._zod ? (type as { schema: SchemaNode }).schema : undefined;

/** Every route the app serves, with the shape of the input it reads. */
export function catalogueRoutes(app: INestApplication): CataloguedRoute[] {
  return listRoutes(app).map((route) => {
    const args = (Reflect.getMetadata(ROUTE_ARGS_METADATA, route.controller, route.methodName) ?? {}) as Record<
      string,
      { index: number }
    >;
    const types = (Reflect.getMetadata('design:paramtypes', route.controller.prototype as object, route.methodName) ??
      []) as unknown[];
    const argOf = (kind: RouteParamtypes) =>
      Object.entries(args).find(([key]) => Number(key.split(':')[0]) === kind)?.[1];
    const body = argOf(RouteParamtypes.BODY);
    const query = argOf(RouteParamtypes.QUERY);
    return {
      ...route,
      readsBody: body !== undefined,
      bodyFields: body ? fieldsOf(schemaOf(types[body.index])) : [],
      queryFields: query ? fieldsOf(schemaOf(types[query.index])) : undefined,
      takesFile: argOf(RouteParamtypes.FILE) !== undefined,
      params: [...route.path.matchAll(/:([A-Za-z]+)/g)].map((m) => m[1]!),
    };
  });
}
