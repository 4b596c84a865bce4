import express, { Router } from 'express';
import { z } from 'zod';
import { buildOpenApiDocument } from '../../../server/http/build-openapi-document';
import { declareRoute } from '../../../server/http/declare-route';

interface Node {
  name: string;
  children: Node[];
}

/** A tree: the one kind of schema zod writes with `$defs` (a `$ref` back to itself). */
const node: z.ZodType<Node> = z.object({
  name: z.string(),
  get children() {
    return z.array(node);
  },
});

describe('buildOpenApiDocument', () => {
  it("moves a recursive schema's definitions into components, so its $ref resolves from the document's root", () => {
    const app = express();
    const trees = Router();
    declareRoute(
      trees,
      'post',
      '/',
      { summary: 'plant a tree', access: ['admin'], body: z.object({ root: node }), responses: { 201: 'planted' } },
      () => undefined,
    );
    app.use('/api/trees', trees);

    const doc = buildOpenApiDocument(app, 'cookie') as {
      paths: Record<string, Record<string, { requestBody: { content: Record<string, { schema: unknown }> } }>>;
      components: { schemas: Record<string, unknown> };
    };
    const text = JSON.stringify(doc);
    const named = [...text.matchAll(/"\$ref":"([^"]+)"/g)].map((m) => m[1]!);
    expect(named.filter((r) => r.startsWith('#/$defs/'))).toEqual([]);
    const inComponents = named.filter((r) => r.startsWith('#/components/schemas/'));
    expect(inComponents.length).toBeGreaterThan(1);
    for (const ref of inComponents)
      expect(doc.components.schemas).toHaveProperty([ref.slice('#/components/schemas/'.length)]);
    expect(doc.paths['/api/trees']!.post!.requestBody.content['application/json']!.schema).toMatchObject({
      required: ['root'],
    });
  });
});
