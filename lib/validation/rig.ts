/** The rig's zod schema for forms, actions and route handlers; defined with the core in lib/towing. */
export { rigInputSchema, parseRig, FIELD_RANGES, type RigInput, type ParseRigResult } from "../towing/input";
