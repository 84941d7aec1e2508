/**
 * Builds the team database's design document `_design/tankside`: a `validate_doc_update` that
 * refuses writes by anyone who is not a member (or admin) of the database, and any record the
 * backup import would refuse. The record check is pwa/sync/record-schema.ts bundled as it is
 * (with the backup validators it imports), so the server and the import cannot drift apart.
 *
 * The bundle is ES2019 with no module syntax: CouchDB 3's JavaScript engine (SpiderMonkey 78/91,
 * or QuickJS from CouchDB 3.4) and the embedded server's evaluator both run it.
 */
import { build } from 'esbuild';
import { fileURLToPath } from 'node:url';

const ENTRY = fileURLToPath(new URL('../../pwa/sync/record-schema.ts', import.meta.url));

export const DESIGN_ID = '_design/tankside';

/** The record check as one self-contained script that defines `tankside_schema`. */
async function bundleSchema() {
  const out = await build({
    entryPoints: [ENTRY],
    bundle: true,
    write: false,
    format: 'iife',
    globalName: 'tankside_schema',
    target: 'es2019',
    platform: 'neutral',
    minify: true,
    legalComments: 'none',
    logLevel: 'silent',
  });
  return out.outputFiles[0].text;
}

/** The validate_doc_update function's source (a function expression, as CouchDB wants). */
export async function validateSource() {
  const schema = await bundleSchema();
  return `function (newDoc, oldDoc, userCtx, secObj) {
  var roles = userCtx.roles || [];
  var members = (secObj && secObj.members) || {};
  var names = members.names || [];
  var memberRoles = members.roles || [];
  // CouchDB's rule: a database with no members listed is open to every signed-in user (the
  // embedded server passes no security object on _bulk_docs; its database-level check applies).
  var open = names.length === 0 && memberRoles.length === 0;
  var ok = open || roles.indexOf('_admin') !== -1 || names.indexOf(userCtx.name) !== -1;
  for (var i = 0; !ok && i < roles.length; i++) ok = memberRoles.indexOf(roles[i]) !== -1;
  if (!ok) throw { forbidden: 'Only members of this team may write to its register.' };
  if (newDoc._deleted === true) return;
  ${schema}
  var reason = tankside_schema.validateSyncDoc(newDoc);
  if (reason) throw { forbidden: 'Refused: ' + reason + '.' };
}`;
}

export async function designDoc() {
  return { _id: DESIGN_ID, language: 'javascript', validate_doc_update: await validateSource() };
}
