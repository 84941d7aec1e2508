/**
 * The ids of the registered rule sets, without their data: the app shell checks a stored choice
 * against them without loading the rules. The registry (sets/index.ts) holds one set per id; the
 * conformance test keeps the two lists equal.
 */
export const RULE_SET_IDS: readonly string[] = ['us-federal'];

/** The set a site or tank without a choice uses. */
export const DEFAULT_RULE_SET_ID = 'us-federal';
