/**
 * The few PouchDB types this project uses (the packages ship none). The browser build
 * (`pouchdb-browser`) is loaded by pwa/sync/engine.ts; the Node packages serve the tests and the
 * embedded team server.
 */
declare namespace PouchDB {
  interface ReplicationHandle {
    on(event: string, listener: (info: unknown) => void): ReplicationHandle;
    cancel(): void;
  }
  interface ChangesHandle {
    on(event: string, listener: (info: unknown) => void): ChangesHandle;
    cancel(): void;
  }
  interface Database {
    readonly name: string;
    replicate: {
      to(target: Database | string, opts?: object): Promise<unknown> & ReplicationHandle;
      from(source: Database | string, opts?: object): Promise<unknown> & ReplicationHandle;
    };
    sync(other: Database | string, opts?: object): ReplicationHandle;
    changes(opts: object): ChangesHandle;
    put(doc: object): Promise<{ id: string; rev: string }>;
    get(id: string, opts?: object): Promise<never>;
    info(): Promise<{ doc_count: number; update_seq: number | string }>;
    destroy(): Promise<void>;
    close(): Promise<void>;
  }
  interface Static {
    new (name: string, opts?: object): Database;
    plugin(plugin: unknown): Static;
    defaults(opts: object): Static;
    fetch(url: string, opts?: RequestInit): Promise<Response>;
  }
}
declare module 'pouchdb-browser' {
  const PouchDB: PouchDB.Static;
  export default PouchDB;
}
declare module 'pouchdb-core' {
  const PouchDB: PouchDB.Static;
  export default PouchDB;
}
declare module 'pouchdb-adapter-memory' {
  const plugin: unknown;
  export default plugin;
}
declare module 'pouchdb-replication' {
  const plugin: unknown;
  export default plugin;
}
declare module 'pouchdb-adapter-http' {
  const plugin: unknown;
  export default plugin;
}
