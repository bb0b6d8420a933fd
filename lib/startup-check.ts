// Refuse to serve with a missing or short session secret: sealed cookies would be forgeable.
const secret = process.env.SESSION_SECRET ?? "";
if (secret.length < 32) {
  console.error(
    "Throwline will not start: SESSION_SECRET must be set and at least 32 characters (npm start writes one to .env.local).",
  );
  process.exit(1);
}
export {};
