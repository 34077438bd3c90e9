/** A tool's warnings (results that hold with a caveat), in the caution colour. */

/** Lists `warnings`, or nothing when there are none. */
export default function WarningList({ warnings }: { warnings: string[] }) {
  if (warnings.length === 0) return null;
  return (
    <div className="rounded-lg border border-caution/40 bg-caution-light p-3 text-sm">
      <p className="font-semibold">Read this with the result</p>
      <ul className="mt-1 list-disc pl-5">
        {warnings.map((w) => (
          <li key={w}>{w}</li>
        ))}
      </ul>
    </div>
  );
}
