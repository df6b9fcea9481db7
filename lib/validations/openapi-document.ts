// The OpenAPI 3 document of the public API, generated from the zod schemas the
// routes use. Served at /api/v1/openapi.json and rendered at /api-docs.
import { OpenAPIRegistry, OpenApiGeneratorV3 } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { MappingSchema } from "@/lib/ingest/mapping";
import { SampleItemSchema, MAX_SAMPLES_PER_CALL } from "./samples";
import { ApiErrorSchema, ApiUploadStatusSchema, IngestSamplesResultSchema, UploadAcceptedSchema } from "./public-api";

// Schemas are written inline rather than as named components: naming them needs
// zod's prototype to be extended before any schema is built (zod 4 copies methods
// onto each schema at creation), or ids in zod's process-wide registry, which a
// re-evaluated module would register twice.
type OpenApiDocument = ReturnType<OpenApiGeneratorV3["generateDocument"]>;
let cached: OpenApiDocument | undefined;

export function buildOpenApiDocument(): OpenApiDocument {
  if (cached) return cached;
  const registry = new OpenAPIRegistry();
  const bearer = registry.registerComponent("securitySchemes", "apiKey", {
    type: "http",
    scheme: "bearer",
    description: "An organization API key (blw_…), made by an administrator under Settings → API keys.",
  });
  // The mapping is documented once as a component (zod's own JSON Schema output).
  registry.registerComponent("schemas", "Mapping", z.toJSONSchema(MappingSchema, { target: "openapi-3.0", unrepresentable: "any" }) as never);
  const Error = ApiErrorSchema;
  const UploadStatus = ApiUploadStatusSchema;
  const UploadAccepted = UploadAcceptedSchema;
  const SampleItem = SampleItemSchema;
  const SamplesResult = IngestSamplesResultSchema;
  const json = (schema: z.ZodType) => ({ "application/json": { schema } });
  const errors = {
    401: { description: "Missing, wrong or revoked API key", content: json(Error) },
    422: { description: "The input is readable but not valid; `issues` lists each problem", content: json(Error) },
  };

  registry.registerPath({
    method: "post",
    path: "/api/v1/uploads",
    summary: "Send a historian CSV file",
    description:
      "Either a text/csv body with ?mapping=<saved mapping name>, or multipart/form-data with a `file` part and a `mapping` (saved name) or `mappingJson` (inline mapping) field. Without either, the saved mapping made for the same header is used. The file is stored, then imported by a worker; follow statusUrl.",
    security: [{ [bearer.name]: [] }],
    request: {
      query: z.object({
        mapping: z.string().optional().describe("name of a saved mapping (text/csv body)"),
        name: z.string().optional().describe("file name to record (text/csv body)"),
      }),
      body: {
        required: true,
        content: {
          "text/csv": { schema: z.string().describe("the file") },
          "multipart/form-data": {
            schema: z.object({
              file: z.string().describe("the file (binary)"),
              mapping: z.string().optional().describe("name of a saved mapping"),
              mappingJson: z.string().optional().describe("a mapping as JSON text (schema: components.schemas.Mapping)"),
            }),
          },
        },
      },
    },
    responses: {
      202: { description: "Stored and queued for import", content: json(UploadAccepted) },
      400: { description: "The request cannot be read (content type, missing file part)", content: json(Error) },
      ...errors,
    },
  });

  registry.registerPath({
    method: "get",
    path: "/api/v1/uploads/{id}",
    summary: "Status, progress and counts of an upload",
    security: [{ [bearer.name]: [] }],
    request: { params: z.object({ id: z.string().regex(/^\d+$/).describe("upload id") }) },
    responses: {
      200: { description: "The upload", content: json(UploadStatus) },
      404: { description: "No such upload in the key's organization", content: json(Error) },
      ...errors,
    },
  });

  registry.registerPath({
    method: "post",
    path: "/api/v1/samples",
    summary: `Send up to ${MAX_SAMPLES_PER_CALL.toLocaleString("en-US")} values as JSON`,
    description:
      "Each sample names its well by UWI or register name, its signal, its time (ISO 8601 with offset, or epoch milliseconds), its value and optionally its unit. A stored (well, signal, time) is replaced by the new value. Bad items are listed in `errors`; the others are stored.",
    security: [{ [bearer.name]: [] }],
    request: { body: { required: true, content: json(z.object({ samples: z.array(SampleItem).max(MAX_SAMPLES_PER_CALL) })) } },
    responses: {
      200: { description: "Stored; per-item problems in errors", content: json(SamplesResult) },
      ...errors,
    },
  });

  cached = new OpenApiGeneratorV3(registry.definitions).generateDocument({
    openapi: "3.0.3",
    info: {
      title: "Bellows public API",
      version: "1.0.0",
      description: "Send historian data to Bellows and follow its import. Authenticate with an organization API key as a Bearer token.",
    },
    servers: [{ url: "/" }],
  });
  return cached;
}
