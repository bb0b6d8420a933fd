export function FormMessage({ message, tone = "error" }: { message?: string | null; tone?: "error" | "ok" }) {
  return (
    <p
      role={tone === "error" ? "alert" : "status"}
      aria-live="polite"
      className={`min-h-5 text-sm ${tone === "error" ? "text-danger" : "text-success"}`}
    >
      {message ?? ""}
    </p>
  );
}
