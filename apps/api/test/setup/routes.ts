import type { INestApplication, Type } from '@nestjs/common';
import { RequestMethod } from '@nestjs/common';
import { METHOD_METADATA, PATH_METADATA } from '@nestjs/common/constants';
import { MetadataScanner, ModulesContainer, Reflector } from '@nestjs/core';
import type { Role } from '@evenset/contracts';
import { PUBLIC_KEY, ROLES_KEY } from '../../src/common/auth/access.decorators';

export interface RouteInfo {
  method: string;
  path: string;
  isPublic: boolean;
  roles: Role[] | undefined;
  handler: string;
  /** The controller class and its method name, to read the handler's argument metadata. */
  controller: Type<unknown>;
  methodName: string;
}

const joinPath = (...parts: string[]) =>
  `/${parts
    .map((p) => p.replace(/^\/|\/$/g, ''))
    .filter(Boolean)
    .join('/')}`;

/** Every route the app serves, read from Nest's own metadata, with the access each one declares. */
export function listRoutes(app: INestApplication): RouteInfo[] {
  const modules = [...app.get(ModulesContainer).values()];
  const scanner = new MetadataScanner();
  const reflector = app.get(Reflector);
  const routes: RouteInfo[] = [];
  for (const wrapper of modules.flatMap((module) => [...module.controllers.values()])) {
    const { instance, metatype } = wrapper;
    if (!instance || !metatype) continue;
    const prototype = Object.getPrototypeOf(instance) as object;
    const base = (Reflect.getMetadata(PATH_METADATA, metatype) as string | undefined) ?? '';
    for (const name of scanner.getAllMethodNames(prototype)) {
      const handler = (prototype as Record<string, unknown>)[name] as object;
      const path = Reflect.getMetadata(PATH_METADATA, handler) as string | undefined;
      if (path === undefined) continue;
      const method = RequestMethod[Reflect.getMetadata(METHOD_METADATA, handler) as RequestMethod];
      routes.push({
        method,
        path: joinPath('api', base, path),
        isPublic: reflector.getAllAndOverride<boolean>(PUBLIC_KEY, [handler as never, metatype]) ?? false,
        roles: reflector.getAllAndOverride<Role[] | undefined>(ROLES_KEY, [handler as never, metatype]),
        handler: `${metatype.name}.${name}`,
        controller: metatype as Type<unknown>,
        methodName: name,
      });
    }
  }
  return routes;
}

/** A concrete URL for a route pattern: every `:param` becomes a well-formed id that exists nowhere. */
export function concretePath(path: string): string {
  return path.replace(/:[A-Za-z]+/g, '00000000-0000-4000-8000-000000000000');
}
