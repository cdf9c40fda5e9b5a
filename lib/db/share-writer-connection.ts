import type { Sequelize } from 'sequelize';

type Connection = { uuid?: string; close(callback?: (err: Error | null) => void): void };
type SqliteConnectionManager = {
  connections: Record<string, Connection>;
  getConnection(options?: { uuid?: string }): Promise<Connection>;
  releaseConnection(connection: Connection, force?: boolean): void;
  destroyConnection(connection: Connection): Promise<void>;
};

const WRITER = 'nodewright-writer';

/**
 * Sequelize's SQLite dialect opens a new connection for every transaction
 * and closes it afterwards: each transaction paid for opening the file,
 * reading the schema and its PRAGMAs. Once transactions run one at a time
 * (serialiseWrites), they can all use one connection that stays open. Reads
 * outside transactions keep the dialect's default connection. A connection
 * Sequelize gives up on (a failed COMMIT or ROLLBACK) is closed and the next
 * transaction opens a fresh one.
 */
export function shareWriterConnection(sequelize: Sequelize): void {
  const manager = (sequelize as unknown as { connectionManager: SqliteConnectionManager }).connectionManager;
  const getConnection = manager.getConnection.bind(manager);
  const releaseConnection = manager.releaseConnection.bind(manager);
  const destroyConnection = manager.destroyConnection.bind(manager);
  const isWriter = (connection: Connection) => manager.connections[WRITER] === connection;

  manager.getConnection = (options) => {
    const forTransaction = options?.uuid !== undefined && options.uuid !== 'default';
    return getConnection(forTransaction ? { ...options, uuid: WRITER } : options);
  };
  manager.releaseConnection = (connection, force) => {
    if (isWriter(connection) && !force) return;
    releaseConnection(connection, force);
  };
  manager.destroyConnection = async (connection) => {
    if (!isWriter(connection)) return destroyConnection(connection);
    delete manager.connections[WRITER];
    await new Promise<void>((resolve) => connection.close(() => resolve()));
  };
}
