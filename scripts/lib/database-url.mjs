// A PostgreSQL URL's database name, and the same server's URL for another database.

export function databaseName(url) {
  return decodeURIComponent(new URL(url).pathname.replace(/^\//, ''));
}

export function withDatabase(url, name) {
  const next = new URL(url);
  next.pathname = `/${encodeURIComponent(name)}`;
  return next.toString();
}
