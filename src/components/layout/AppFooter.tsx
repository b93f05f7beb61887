/** Standing cautions for the whole product, in plain words. */
export function AppFooter() {
  return (
    <footer className="mt-12 border-t border-steel-200 bg-steel-50">
      <div className="mx-auto max-w-7xl px-4 py-5 text-xs leading-relaxed text-steel-600 md:px-6">
        <p>
          <strong className="text-ink-800">Tackline supports, it does not replace, the applicable code.</strong>{' '}
          Pressure ratings, wall thickness and test pressures are the engineer of record's. Weights and centres of gravity
          are estimates: lifts are planned by a competent person. Hot work needs the shop's permits, PPE and fume control.
          Pressure tests store energy: keep the exclusion zone and follow the test procedure. Follow local codes and
          qualified, licensed people.
        </p>
      </div>
    </footer>
  );
}
