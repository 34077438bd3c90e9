/** The one-click "Load sample data" button of a tool, saying plainly that the numbers are made up. */

/** A button that fills the tool with invented sample data, with a line describing it. */
export default function SampleDataButton({ onLoad, description }: { onLoad: () => void; description: string }) {
  return (
    <div className="no-print flex flex-wrap items-center gap-3">
      <button type="button" className="btn-secondary" onClick={onLoad}>
        Load sample data
      </button>
      <span className="text-sm text-ink-soft">Sample data: {description}</span>
    </div>
  );
}
