#!/usr/bin/env bash
# Moves holdfast's packages into layers without cycles. Run it ONCE, from anywhere inside the
# repository, on a clean working tree (everything committed), after the branches it was written
# beside have been merged:
#
#     tools/restructure.sh            # moves, rewrites, adds the architecture tests
#     tools/restructure.sh --verify   # the same, then compiles and lists any package cycle left
#
# It stages everything (git mv / git add) and commits nothing: review `git status`, build, run the
# suite, then commit. Each step checks what it needs and stops with one line naming the file and
# the text it could not find; a step that is already done is skipped, so running it twice changes
# nothing. Undo everything with `git reset --hard && git clean -fd engine viewer tools`.
#
# What it does (the plan and the reasons are in tools/DEVELOPERS-after.md):
#  1. schema    scenario.{Node,NumberReader,Overrides,ScenarioException,ScenarioFile,InputText}:
#               the bottom layer every domain reader uses (no domain imports).
#               output.RunFolder.reason(IOException) -> schema.IoFailure.reason, which InputText
#               uses (RunFolder.reason stays, delegating), where a branch added InputText.
#  2. console   cli.Version (and its version.properties), cli.RunProgress -> console, so that
#               sweep and replay no longer import the command line.
#  3. bench     bench.BenchCommand -> cli (a command like the others); bench keeps the BenchSuite
#               interface the suites implement, at the bottom.
#  4. forces    fates.Binding -> forces (runs merge by it, fates judge by it);
#     group     forces.CoulombLog -> group (a choice the scenario makes; group stays plain data).
#  5. integrators  run.RunSettings.Scheme -> integrators.Scheme, so the scheme choice supplies its
#               integrator and integrators no longer import run.
#  6. names     observe.Observer -> observe.ObserverSite, output.Palette -> output.ChartPalette,
#               window.Projection -> render.ProjectionKind.
#  7. viewer    window.{Camera,CameraSpec} -> render; replay.RunFrameSource -> window;
#               window.input.Controls -> window; window.ViewCommand -> viewer
#               (the view command, beside HoldfastFull; film.RenderCommand stays with films).
#  8. duplicate CosmologicalConstant removed: new ConstantW(-1) everywhere (same numbers exactly).
#  9. tests     an ArchitectureTest in each module (ArchUnit, test scope) and its pom entries.
# 10. docs      DEVELOPERS.md: its Layout section replaced by tools/DEVELOPERS-after.md's (layers,
#               each package's job); moved names updated in the rest.
# Then it compiles (mvn -o; MVN_OFFLINE= tools/restructure.sh lets Maven download) and makes
# public each member javac reports out of reach after a move (tools/open-access.pl), and stages all.
# A type's test (XTest) moves with it. Every fully qualified name in sources, resources (the
# bench service lists), poms and the README is rewritten; same-package users get imports.
set -euo pipefail

VERIFY=0
[[ "${1:-}" == "--verify" ]] && VERIFY=1

cd "$(git rev-parse --show-toplevel)"
HERE=tools
if [[ -n "$(git status --porcelain --untracked-files=no)" ]]; then
    echo "restructure: commit or stash your changes first (git status shows some)" >&2
    exit 1
fi
for f in "$HERE/restructure.pl" "$HERE/open-access.pl" "$HERE/ArchitectureTest-engine.java" "$HERE/ArchitectureTest-viewer.java"; do
    [[ -f "$f" ]] || { echo "restructure: $f is missing (it comes with this script)" >&2; exit 1; }
done

echo "restructure: moving types"
perl "$HERE/restructure.pl" <<'PLAN'
# 1. the schema layer
move org.holdfast.scenario.ScenarioException org.holdfast.schema.ScenarioException
move org.holdfast.scenario.NumberReader org.holdfast.schema.NumberReader
move org.holdfast.scenario.Overrides org.holdfast.schema.Overrides
move org.holdfast.scenario.Node org.holdfast.schema.Node
move org.holdfast.scenario.ScenarioFile org.holdfast.schema.ScenarioFile
maybe-move org.holdfast.scenario.InputText org.holdfast.schema.InputText
lift-method org.holdfast.output.RunFolder reason org.holdfast.schema.IoFailure
package-info org.holdfast.schema The grammar of input files, below every domain package: a checked TOML tree (Node) with file:line:key errors, --set overrides and the number reader each value passes through.
# 2. version and progress out of the command line
move org.holdfast.cli.Version org.holdfast.console.Version
resource engine/src/main/resources/org/holdfast/cli/version.properties engine/src/main/resources/org/holdfast/console/version.properties
move org.holdfast.cli.RunProgress org.holdfast.console.RunProgress
package-info org.holdfast.console What a run tells the person at the terminal: the program's version and a run's progress.
# 3. the bench command beside the other commands
move org.holdfast.bench.BenchCommand org.holdfast.cli.BenchCommand
# 4. binding and the Coulomb logarithm where both sides can use them
move org.holdfast.fates.Binding org.holdfast.forces.Binding
move org.holdfast.forces.CoulombLog org.holdfast.group.CoulombLog
# 5. the scheme choice supplies its integrator
nested org.holdfast.run.RunSettings Scheme org.holdfast.integrators.Scheme
# 6. names that say what they are
move org.holdfast.observe.Observer org.holdfast.observe.ObserverSite
move org.holdfast.output.Palette org.holdfast.output.ChartPalette
move org.holdfast.window.Projection org.holdfast.render.ProjectionKind
# 7. the viewer: camera in render, frame source and controls in window, commands on top
move org.holdfast.window.Camera org.holdfast.render.Camera
move org.holdfast.window.CameraSpec org.holdfast.render.CameraSpec
move org.holdfast.replay.RunFrameSource org.holdfast.window.RunFrameSource
move org.holdfast.window.input.Controls org.holdfast.window.Controls
move org.holdfast.window.ViewCommand org.holdfast.viewer.ViewCommand
PLAN

echo "restructure: small edits"
# Edits that are not moves. Each names its anchor and fails if the anchor is gone.
edit() { # edit FILE PERL-SUBSTITUTION DESCRIPTION: apply once; fail if it neither applies nor is done
    local file=$1 expr=$2 what=$3 done_re=${4:-}
    [[ -f "$file" ]] || { echo "restructure: $file is missing ($what)" >&2; exit 1; }
    if [[ -n "$done_re" ]] && grep -Eq "$done_re" "$file"; then echo "  (already) $what"; return; fi
    perl -0pi -e "\$n = ($expr); END { exit(\$n ? 0 : 3) }" "$file" \
        || { echo "restructure: $file: anchor not found for: $what" >&2; exit 1; }
    git add "$file"
    echo "  $what"
}
SCHEME=engine/src/main/java/org/holdfast/integrators/Scheme.java
# The scheme supplies its integrator (Integrator.of stays for callers that hold only the enum).
edit "$SCHEME" 's/(\n)(\s*\/\*\* The name used in scenario files\. \*\/)/$1\n    \/** A new integrator of this scheme. *\/\n    public Integrator integrator() {\n        return Integrator.of(this);\n    }\n$1$2/' \
    "Scheme.integrator()" 'public Integrator integrator\(\)'
edit engine/src/main/java/org/holdfast/bench/package-info.java \
    's/\A\/\*\*.*?\*\//\/** The interface every `holdfast bench` suite implements (found through ServiceLoader); the command is cli.BenchCommand. *\//s' \
    "bench package note" 'cli\.BenchCommand'

# A duplicate: CosmologicalConstant is ConstantW(-1), which computes the same numbers exactly.
CC=engine/src/main/java/org/holdfast/expansion/CosmologicalConstant.java
if [[ -f "$CC" ]]; then
    grep -q 'w == -1.0 ? 0.0' engine/src/main/java/org/holdfast/expansion/ConstantW.java \
        || { echo "restructure: ConstantW has no exact w = -1 case; keeping CosmologicalConstant" >&2; exit 1; }
    for f in $(grep -rl 'CosmologicalConstant' --include=*.java engine viewer | grep -v "$CC" || true); do
        perl -pi -e 's/new (org\.holdfast\.expansion\.|)CosmologicalConstant\(\)/new ${1}ConstantW(-1)/g;
            s/^import org\.holdfast\.expansion\.CosmologicalConstant;/import org.holdfast.expansion.ConstantW;/' "$f"
    done
    left=$(grep -rlw 'CosmologicalConstant' --include=*.java engine viewer | grep -v "$CC" || true)
    [[ -z "$left" ]] || { echo "restructure: CosmologicalConstant still named in: $left" >&2; exit 1; }
    git rm -q "$CC"
    echo "  CosmologicalConstant -> ConstantW(-1)"
fi

echo "restructure: architecture tests"
put_test() { # put_test MODULE
    local m=$1 dst=$1/src/test/java/org/holdfast/ArchitectureTest.java
    mkdir -p "$(dirname "$dst")"
    cp "$HERE/ArchitectureTest-$m.java" "$dst"
    git add "$dst"
    if ! grep -q '<artifactId>archunit-junit5</artifactId>' "$m/pom.xml"; then
        perl -0pi -e '$n = s{(\n(\s*)<dependency>\s*<groupId>org\.junit\.jupiter</groupId>\s*<artifactId>junit-jupiter</artifactId>\s*<scope>test</scope>\s*</dependency>)}{$1\n$2<dependency>\n$2  <groupId>com.tngtech.archunit</groupId>\n$2  <artifactId>archunit-junit5</artifactId>\n$2  <version>\${archunit.version}</version>\n$2  <scope>test</scope>\n$2</dependency>}; END { exit($n ? 0 : 3) }' "$m/pom.xml" \
            || { echo "restructure: $m/pom.xml: no junit-jupiter test dependency to put ArchUnit after" >&2; exit 1; }
        git add "$m/pom.xml"
    fi
    echo "  $dst"
}
put_test engine
put_test viewer
if ! grep -q '<archunit.version>' pom.xml; then
    perl -0pi -e '$n = s{(\n(\s*)<junit\.version>[^<]*</junit\.version>)}{$1\n$2<archunit.version>1.4.1</archunit.version>}; END { exit($n ? 0 : 3) }' pom.xml \
        || { echo "restructure: pom.xml: no <junit.version> property to put <archunit.version> after" >&2; exit 1; }
    git add pom.xml
fi
# DEVELOPERS.md: the Layout section comes from tools/DEVELOPERS-after.md (the layers, each
# package's job); the rest keeps what the merged branches wrote, with the moved names updated.
if [[ -f "$HERE/DEVELOPERS-after.md" ]] && ! grep -q '^## Layout: layers without cycles' DEVELOPERS.md; then
    perl -0pi -e '
        open my $h, "<", "'"$HERE"'/DEVELOPERS-after.md" or die; local $/; my $after = <$h>;
        my ($layout) = $after =~ /(^## Layout.*?)(?=^## )/ms or die "no Layout section in DEVELOPERS-after.md\n";
        s/^## Layout.*?(?=^## )/$layout/ms or die "no ## Layout section in DEVELOPERS.md\n";
        s/`Node` from `org\.holdfast\.scenario`/`Node` from `org.holdfast.schema`/g;
        s/a `ScenarioException`/a `schema.ScenarioException`/g;
        s/`fates\.Binding`/`forces.Binding`/g;
        s/`window\.Projection`/`render.ProjectionKind`/g;
        s/(?<![\w.])`Controls`/`window.Controls`/g;
        s/`cli\.(Version|RunProgress)`/`console.$1`/g;
        s/RunSettings\.Scheme/integrators.Scheme/g;
        s/weights \(Yoshida.s fourth order is one\)\./weights (Yoshida\x27s fourth order is one), a constant in `integrators.Scheme` (its scenario name)\nand its case in `Integrator.of`; `Scheme.integrator()` hands it to the run./;
    ' DEVELOPERS.md || { echo "restructure: DEVELOPERS.md: could not replace its Layout section" >&2; exit 1; }
    git add DEVELOPERS.md
    echo "  DEVELOPERS.md: Layout section from $HERE/DEVELOPERS-after.md, moved names updated (see its How to add for the rest)"
fi

# A member or type that only its old package used is package-private; after the move javac names
# each one ("... is not public in ...; cannot be accessed from outside package"): make those public.
echo "restructure: compiling, and opening what the moves put out of reach"
MVN=(mvn -B -q ${MVN_OFFLINE--o} -DskipTests)
for pass in 1 2 3 4 5 6 7 8 9 10; do
    if out=$("${MVN[@]}" test-compile 2>&1); then
        echo "  main and test code compile"
        break
    fi
    if ! grep -q 'is not public in' <<<"$out"; then
        grep -E '^\[ERROR\] .*\.java' <<<"$out" | sort -u | head -40 >&2 || echo "$out" | tail -40 >&2
        echo "restructure: compile errors that are not about access (above): fix them by hand" >&2
        exit 1
    fi
    perl "$HERE/open-access.pl" <<<"$out" || { echo "restructure: could not open them all (above)" >&2; exit 1; }
    [[ $pass == 10 ]] && { echo "restructure: still not compiling after 10 passes" >&2; exit 1; }
done

# Folders that the moves emptied; everything staged for review.
find engine/src viewer/src -type d -empty -delete
git add -A engine viewer pom.xml DEVELOPERS.md

echo "restructure: done; review with git status, then build and test"
if (( VERIFY )); then
    "${MVN[@]}" package
    python3 "$HERE/package-cycles.py" engine/target/classes
    python3 "$HERE/package-cycles.py" viewer/target/classes engine/target/classes
fi
