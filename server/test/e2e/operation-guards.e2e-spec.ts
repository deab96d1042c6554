import { afterAll, beforeAll, describe, expect, it } from '@jest/globals';
import type { INestApplication } from '@nestjs/common';
import { MetadataScanner, ModulesContainer } from '@nestjs/core';
import { GraphQLSchemaHost } from '@nestjs/graphql';

import { IS_PUBLIC } from '../../src/common/auth/public.decorator.js';
import { REQUIRED_ROLES } from '../../src/common/auth/roles.decorator.js';
import { createTestApp } from '../utils/test-app.js';

// @nestjs/graphql's own metadata keys for resolver methods.
const RESOLVER_TYPE = 'graphql:resolver_type';
const RESOLVER_NAME = 'graphql:resolver_name';

describe('default-deny on every operation', () => {
  let app: INestApplication;
  beforeAll(async () => {
    app = await createTestApp();
  });
  afterAll(async () => {
    await app.close();
  });

  it('marks every Query and Mutation in the schema @Public() or with the roles it needs', () => {
    const declared = new Map<string, { isPublic: boolean; roles: unknown }>();
    const scanner = new MetadataScanner();
    const wrappers = [...app.get(ModulesContainer).values()].flatMap((m) => [...m.providers.values()]);
    for (const wrapper of wrappers) {
      const instance = wrapper.instance as Record<string, unknown> | undefined;
      if (!instance || typeof instance !== 'object') continue;
      const prototype = Object.getPrototypeOf(instance) as object;
      for (const method of scanner.getAllMethodNames(prototype)) {
        const handler = (prototype as Record<string, unknown>)[method] as object;
        const type = Reflect.getMetadata(RESOLVER_TYPE, handler) as string | undefined;
        if (type !== 'Query' && type !== 'Mutation') continue;
        const name = (Reflect.getMetadata(RESOLVER_NAME, handler) as string | undefined) ?? method;
        const klass = instance.constructor;
        declared.set(`${type}.${name}`, {
          isPublic: Reflect.getMetadata(IS_PUBLIC, handler) === true || Reflect.getMetadata(IS_PUBLIC, klass) === true,
          roles: Reflect.getMetadata(REQUIRED_ROLES, handler) ?? Reflect.getMetadata(REQUIRED_ROLES, klass),
        });
      }
    }
    const { schema } = app.get(GraphQLSchemaHost);
    const operations = [
      ...Object.keys(schema.getQueryType()?.getFields() ?? {}).map((f) => `Query.${f}`),
      ...Object.keys(schema.getMutationType()?.getFields() ?? {}).map((f) => `Mutation.${f}`),
    ];
    expect(operations.length).toBeGreaterThan(5);
    const unguarded = operations.filter((op) => {
      const meta = declared.get(op);
      return !meta || (!meta.isPublic && !(Array.isArray(meta.roles) && meta.roles.length > 0));
    });
    expect(unguarded).toEqual([]);
  });
});
