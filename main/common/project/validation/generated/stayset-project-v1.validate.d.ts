import type { ErrorObject } from 'ajv';

/** Precompiled ajv validator of stayset-project.v1.schema.json (see ../validator-source.ts). */
declare const validate: ((data: unknown) => boolean) & { errors?: ErrorObject[] | null };
export default validate;
export { validate };
