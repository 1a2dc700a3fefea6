// Calls every operation of a running service through the TypeScript client generated from
// api-examples/openapi.json (openapi-generator, typescript-fetch), compiled with tsc --strict: no
// hand-written HTTP. Typed calls first (a calculation, an answer kept as received and verified, a
// batch with typed rows), then every other operation of the document with its documented example,
// so an operation added later is called too. Usage: node calls.js BASE_URL api-examples/
// Prints one line per operation and a closing "N passed, N failed" line; exit status 1 on a failure.
import { BaseAPI, Configuration, ResponseError } from '../../../target/generated-ts-client/runtime';
import * as apis from '../../../target/generated-ts-client/apis';
import * as models from '../../../target/generated-ts-client/models';
import { BatchesApi, PulseAndBeamApi, StampsApi } from '../../../target/generated-ts-client/apis';
import { PulseParametersBatchRowStatusEnum } from '../../../target/generated-ts-client/models';
import type { PulseParametersRequest } from '../../../target/generated-ts-client/models';

declare const require: (module: string) => any;
declare const process: { argv: string[]; exitCode?: number };
const fs = require('fs');

const base = process.argv[2];
const examples = process.argv[3];
// Batches answer NDJSON unless asked: a client that parses one JSON value asks for the JSON array.
const config = new Configuration({ basePath: base, headers: { Accept: 'application/json' } });
const called = new Map<string, string>();
let passed = 0;
let failed = 0;

function record(operationId: string, ok: boolean, detail: string): void {
    called.set(operationId, detail);
    if (ok) {
        passed++;
        console.log(`ok   ${operationId} ${detail}`);
    } else {
        failed++;
        console.log(`FAIL ${operationId} ${detail}`);
    }
}

async function typedCalls(): Promise<void> {
    const pulse = new PulseAndBeamApi(config);
    const request: PulseParametersRequest = {
        frequencyMhz: 5, bandwidthPercent: 60, elementDiameterMm: 10, material: 'carbon-steel',
    };
    const answer = await pulse.postPulseParameters({ pulseParametersRequest: request });
    // period = 1 / f = 1 / 5 MHz = 0.2 us (definition of the period)
    record('postPulseParameters', answer.periodUs === 0.2 && answer.stamp?.calculation === 'pulse-parameters',
        `period_us ${answer.periodUs}`);

    // An answer kept as received (its text, not the generated model) verifies.
    const raw = await pulse.postPulseParametersRaw({ pulseParametersRequest: request });
    const kept: string = await raw.raw.text();
    const verdict = await new StampsApi(config).postStampVerifications(
        { stampVerificationRequest: { document: JSON.parse(kept) } });
    record('postStampVerifications', verdict.contentIntact === true && verdict.reproducible === true,
        `kept answer: content_intact ${verdict.contentIntact}, reproducible ${verdict.reproducible}`);

    // A batch with typed rows: one good row, one bad row (a pulse needs its bandwidth).
    const rows = await new BatchesApi(config).postPulseParametersBatch(
        { pulseParametersRequest: [request, { frequencyMhz: 5 } as PulseParametersRequest] });
    record('postPulseParametersBatch', rows.length === 2 && rows[0].status === PulseParametersBatchRowStatusEnum.Ok
        && rows[0].result?.periodUs === 0.2 && rows[1].status === PulseParametersBatchRowStatusEnum.Invalid
        && rows[1].problem?.status === 400, `rows ${rows.map(r => `${r.row} ${r.status}`).join(', ')}`);
}

/** The names a generated method reads from its parameters, from its compiled code. */
function parameterNames(api: any, operationId: string): string[] {
    const code: string = String(api[operationId + 'RequestOpts']);
    return [...new Set([...code.matchAll(/requestParameters\['(\w+)'\]/g)].map(m => m[1]))];
}

function camel(name: string): string {
    return name.replace(/_([a-z0-9])/g, (_, c: string) => c.toUpperCase());
}

/** A JSON example as the generated model (the client's ToJSON maps it back to the contract's names). */
function fromJson(schema: any, value: any): any {
    if (schema?.$ref) {
        const name = schema.$ref.substring(schema.$ref.lastIndexOf('/') + 1);
        const reader = (models as any)[name + 'FromJSON'];
        return reader ? reader(value) : value;
    }
    if (schema?.type === 'array' && Array.isArray(value)) {
        return value.map(v => fromJson(schema.items, v));
    }
    return value;
}

async function everyOtherOperation(doc: any): Promise<void> {
    const instances: any[] = Object.values(apis)
        .filter((c: any) => typeof c === 'function' && c.prototype instanceof BaseAPI)
        .map((c: any) => new c(config));
    for (const [path, item] of Object.entries<any>(doc.paths)) {
        for (const [method, op] of Object.entries<any>(item)) {
            const id: string = op.operationId;
            if (called.has(id)) {
                continue;
            }
            const api = instances.find(a => typeof a[id] === 'function');
            if (!api) {
                record(id, false, `${method.toUpperCase()} ${path}: no method in the generated client`);
                continue;
            }
            const params: any = {};
            for (const p of op.parameters ?? []) {
                const example = p.example ?? p.schema?.example;
                if (example !== undefined) {
                    params[camel(p.name)] = example;
                }
            }
            const media = op.requestBody?.content?.['application/json'];
            if (media) {
                const name = path.replace(/^\/api\//, '').replace(/\/batch$/, '');
                const file = `${examples}/${name}.json`;
                const example = media.example ?? (fs.existsSync(file) ? JSON.parse(fs.readFileSync(file, 'utf8')) : undefined);
                // the body's parameter: the one named after the body's schema, else the first unset one
                const names = parameterNames(api, id).filter(n => !(n in params));
                const ref: string | undefined = media.schema?.$ref ?? media.schema?.items?.$ref;
                const wanted = ref?.substring(ref.lastIndexOf('/') + 1).toLowerCase();
                const bodyName = names.find(n => n.toLowerCase() === wanted) ?? names[0];
                if (example === undefined || bodyName === undefined) {
                    record(id, false, `${method.toUpperCase()} ${path}: no example body`);
                    continue;
                }
                params[bodyName] = fromJson(media.schema, example);
            }
            try {
                const answer = await api[id](params);
                // a batch's rows must all be OK: the example went through the generated models intact
                const ok = Array.isArray(answer) ? answer.length > 0 && answer.every((r: any) => r.status === 'OK')
                    : answer !== undefined && answer !== null;
                record(id, ok, `${method.toUpperCase()} ${path}`);
            } catch (e) {
                const detail = e instanceof ResponseError ? `${e.response.status} ${await e.response.text()}` : String(e);
                record(id, false, `${method.toUpperCase()} ${path}: ${detail.substring(0, 300)}`);
            }
        }
    }
}

async function main(): Promise<void> {
    const doc = JSON.parse(fs.readFileSync(`${examples}/openapi.json`, 'utf8'));
    try {
        await typedCalls();
    } catch (e) {
        const detail = e instanceof ResponseError ? `${e.response.status} ${await e.response.text()}` : String(e);
        record('typed calls', false, detail.substring(0, 300));
    }
    await everyOtherOperation(doc);
    console.log(`${passed} passed, ${failed} failed`);
    process.exitCode = failed > 0 ? 1 : 0;
}

main();
