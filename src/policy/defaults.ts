// The built-in policy for communication backbones, used when a repository has no policy
// file, and the starter file `netbrace init` writes. Both are the same text, so what the
// starter says is exactly what applies without one. Parameter choices are common practice
// for a first gate, not a standard: tune them for the network at hand.

export const DEFAULT_POLICY_PATH = '.netbrace.yaml';

/** The name diagnostics use for the built-in policy. */
export const BUILTIN_POLICY_NAME = '<built-in policy>';

/**
 * The built-in glob for CSV edge lists. A CSV it alone selects is judged only when its header
 * names source and target columns (csvHasEdgeHeader): a repository's other CSV files (a
 * spreadsheet of anything else) are not designs.
 */
export const CSV_DESIGN_GLOB = '**/*.csv';

export const DEFAULT_DESIGN_GLOBS: readonly string[] = [
  '**/*.graphml',
  '**/*.gml',
  '**/*.net.yaml',
  '**/*.net.yml',
  '**/*.net.json',
  CSV_DESIGN_GLOB,
];

/**
 * Radius of a regional challenge that sets no `until`, in km. Fixed rather than derived from
 * each design (so base and head share one grid); 50 km is a metropolitan-scale disaster, a
 * round figure chosen for a first gate (common practice is to set it per hazard and region).
 */
export const REGIONAL_UNTIL_KM = 50;

/**
 * Sources efficiency searches from on larger designs when a policy sets none (r-value sources):
 * 1,024 keep the estimate's standard error near 1e-3 of R on sparse designs of 4,000–10,000
 * sites (measured on seeded Barabási–Albert designs, intact and with a fifth of the sites gone),
 * a twentieth of the usual allowed drop, at a quarter to a tenth of the exact search's cost.
 */
export const DEFAULT_SOURCES = 1024;

/** Default error multiple: drops below 2 standard errors are Monte Carlo noise (about 95 % two-sided, common practice). */
export const DEFAULT_ERROR_MULTIPLE = 2;

export const STARTER_POLICY = `# netbrace policy: what a network design must satisfy before a change to it merges.
# Every key is optional; a key left out takes the value of the built-in policy, which is
# exactly this file. Editors can check it against policy.schema.json (shipped in dist/).
#
# netbrace informs engineering judgement; it does not replace engineering studies.
# Local codes, regulators' standards and licensed practice decide for real infrastructure.
version: 1

# Which files are designs (globs from the repository root; "format" forces a format).
# A CSV that only "**/*.csv" selects is a design when its header has source and target
# columns; other CSV files are left alone. List CSV designs by another glob to judge them always.
designs:
  - paths: ["**/*.graphml", "**/*.gml", "**/*.net.yaml", "**/*.net.yml", "**/*.net.json", "**/*.csv"]
# exclude: ["archive/**"]

# Seed of every random challenge: the same inputs and seed give the same report.
seed: 1

# R, the robustness value: normalized metrics (each in [0, 1]) combined into one number.
r-value:
  metrics:
    pair_connectivity: 1   # share of node pairs that can still reach each other
    efficiency: 1          # mean inverse hop distance
  combine: mean            # mean (weighted) or min
  # On designs of more sites, efficiency searches from this many seeded sites (the same on base
  # and head) instead of all: an unbiased estimate whose standard error joins the ±; "all" is exact.
  sources: 1024

# Challenges, each under a name of your choosing (requirements refer to it).
#   remove:   nodes | links | risk-groups | region
#   order:    random (a Monte Carlo envelope) | degree | betweenness | eigenvector |
#             closeness (targeted attacks, highest score first) | worst-first (risk groups)
#   adaptive: true recomputes the attack's scores after every removal
challenges:
  node-failures:
    remove: nodes
    order: random
    until: 0.2             # up to 20 % of the nodes fail
    points: 5              # grid 0, 0.05, 0.1, 0.15, 0.2
    realizations: 200
    band: [0.1, 0.9]       # the envelope's lower and upper quantile
  link-failures:
    remove: links
    order: random
    until: 0.2
    points: 5
    realizations: 200
    band: [0.1, 0.9]
  degree-attack:
    remove: nodes
    order: degree
    adaptive: true
    until: 0.2

# Requirements; severity is fail (the check fails), warn or notice.
requirements:
  # A change may not add a bridge, a cut node or a shared-risk group (a duct) whose loss cuts
  # sites off, that the base did not have. A new weak point hidden behind an element that the
  # change marks hardened is a warning: hardening is a claim netbrace cannot verify.
  - kind: no-new-spof
    severity: fail
    hardened-weak-points: warn
  # Areas under the envelopes, tracked for weakening (no floor of their own).
  - kind: area-floor
    challenge: node-failures
  - kind: area-floor
    challenge: link-failures
  - kind: area-floor
    challenge: degree-attack
  # Floors to set for your network, for example:
  # - kind: r-threshold      # the 10 % quantile of R with 10 % of nodes failed
  #   challenge: node-failures
  #   at: 0.1
  #   statistic: quantile
  #   q: 0.1
  #   min: 0.6
  # - kind: n-1              # no single link failure drops R below 0.8
  #   element: link
  #   min: 0.8

# How far a requirement's value may drop from the base to the head.
weakening:
  allowed-drop: 0.02       # in units of R
  error-multiple: 2        # a drop below 2 × its Monte Carlo error never fails
  severity: fail

# A deleted design file: fail | warn | notice | ignore.
removed-designs: notice

# Work each evaluation of a design may take (head and base each). Beyond it the engine runs
# fewer realizations or N-1 cases and the report marks the result as reduced; what the reduced
# work cannot settle is "unsettled", never a pass. Seconds are converted to work at a fixed
# rate (5e7 element visits per second), so a report never depends on the machine's speed.
budget:
  seconds: 60              # at most a minute; a 1,000-node design needs about 10 s here
  # visits: 3e9            # the same in element visits; with both, the smaller applies

# Rules for some files only; they may add or tighten requirements, never loosen them
# (and raise the budget, never lower it).
# scopes:
#   - paths: "core/**"
#     requirements:
#       - kind: n-1
#         element: node
#         min: 0.7
`;
