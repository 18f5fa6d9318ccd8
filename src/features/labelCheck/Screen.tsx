// PLACEHOLDER: replaced by the issue that builds this calculator. Must not survive to a release.
export default function Screen() {
  return <p>This calculator is being built.</p>;
}
