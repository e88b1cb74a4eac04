#!/usr/bin/env perl
# Package moves for holdfast, driven by tools/restructure.sh (read that file's header first).
#
# Commands, one per line on standard input (blank lines and # comments skipped):
#   move OLD.FQN NEW.FQN      move (and maybe rename) a top-level type, with its XTest if any
#   maybe-move OLD.FQN NEW.FQN    the same where OLD exists (a type some branches add)
#   nested OUTER.FQN NAME NEW.FQN   lift a nested type OUTER.NAME out into its own file NEW.FQN
#   lift-method OWNER.FQN NAME NEW.FQN   copy a static method down a layer, OWNER's delegates
#   resource OLD/PATH NEW/PATH      git mv a resource (paths relative to the repository root)
#   package-info PKG TEXT           write PKG's package-info.java if it has none (TEXT: one line)
# Every step checks its anchors and dies with a message naming what it could not find; a step
# already done (its target exists and its source does not) is skipped, so a second run is a no-op.
use strict;
use warnings;
use File::Path qw(make_path);
use File::Basename qw(dirname);

my @ROOTS = grep { -d } map { my $m = $_; map { "$m/src/$_/java" } qw(main test) } qw(engine viewer);
my @TEXT_DIRS = grep { -d } qw(engine/src viewer/src);

sub slurp { my ($f) = @_; open my $h, '<:raw', $f or die "restructure: cannot read $f: $!\n"; local $/; my $c = <$h>; close $h; return $c; }
sub spew { my ($f, $c) = @_; open my $h, '>:raw', $f or die "restructure: cannot write $f: $!\n"; print $h $c; close $h; }
sub sh { my @cmd = @_; system(@cmd) == 0 or die "restructure: failed: @cmd\n"; }

sub java_files {
    my @out;
    for my $r (@ROOTS) {
        open my $p, '-|', 'find', $r, '-name', '*.java', '-type', 'f' or die;
        while (<$p>) { chomp; push @out, $_; }
        close $p;
    }
    return sort @out;
}

# Text files that may hold fully qualified names: sources, resources (service lists), poms, docs.
sub text_files {
    my @out;
    for my $d (@TEXT_DIRS) {
        open my $p, '-|', 'find', $d, '-type', 'f', '(', '-name', '*.java', '-o', '-path', '*/resources/*', ')' or die;
        while (<$p>) { chomp; push @out, $_ unless /\.(png|jpg|h5|bin|class)$/; }
        close $p;
    }
    push @out, grep { -f } qw(pom.xml engine/pom.xml viewer/pom.xml README.md);
    return @out;
}

sub split_fqn { my ($f) = @_; $f =~ /^(.*)\.([A-Za-z_]\w*)$/ or die "restructure: bad name $f\n"; return ($1, $2); }
sub path_of { my ($fqn) = @_; (my $p = $fqn) =~ s{\.}{/}g; return "$p.java"; }
sub pkg_of { my ($c) = @_; return $c =~ /^\s*package\s+([\w.]+)\s*;/m ? $1 : ''; }

# Code with comments, strings and character literals blanked (for "does this file use X").
sub code_only {
    my ($c) = @_;
    $c =~ s{("""(?:.|\n)*?"""|"(?:\\.|[^"\\\n])*"|'(?:\\.|[^'\\\n])+'|//[^\n]*|/\*(?:.|\n)*?\*/)}{
        my $m = $1; ($m =~ m{^/[/*]} && $m =~ /(\{\@link(?:plain)?\s+[\w.#]+|\@see\s+[\w.#]+|\@throws\s+[\w.]+)/) ? join(' ', $m =~ /(?:\{\@link(?:plain)?|\@see|\@throws)\s+([\w.]+)/g) : ' '
    }ge;
    return $c;
}

sub uses { my ($c, $name) = @_; return code_only($c) =~ /(?<![\w.])\Q$name\E\b/; }
sub imports_name { my ($c, $name) = @_; return $c =~ /^\s*import\s+(?!static)[\w.]+\.\Q$name\E\s*;/m; }
sub imports_fqn { my ($c, $fqn) = @_; return $c =~ /^\s*import\s+\Q$fqn\E\s*;/m; }

sub add_import {
    my ($c, $fqn) = @_;
    return $c if imports_fqn($c, $fqn);
    if ($c =~ /\A(.*^import\s+org\.holdfast\.[^\n]*\n)/ms) {
        my $head = $1; substr($c, length($head), 0) = "import $fqn;\n";
    } elsif ($c =~ /\A(.*^import\s+(?!static)[^\n]*\n)/ms) {
        my $head = $1; substr($c, length($head), 0) = "\nimport $fqn;\n";
    } elsif ($c =~ /\A(.*?^package\s+[\w.]+\s*;[^\n]*\n)/ms) {
        my $head = $1; substr($c, length($head), 0) = "\nimport $fqn;\n";
    } else {
        die "restructure: no package line to put 'import $fqn' under\n";
    }
    return $c;
}

# Renames the identifier $old to $new outside string and character literals.
sub rename_ident {
    my ($c, $old, $new) = @_;
    return $c if $old eq $new;
    my @parts = split /("""(?:.|\n)*?"""|"(?:\\.|[^"\\\n])*"|'(?:\\.|[^'\\\n])+')/, $c;
    for (my $i = 0; $i < @parts; $i += 2) { $parts[$i] =~ s/(?<![\w\$.])\Q$old\E(?![\w\$])/$new/g; }
    return join '', @parts;
}

# Simple names of the types in package $pkg, over the given roots.
sub types_in {
    my ($pkg, @roots) = @_;
    (my $dir = $pkg) =~ s{\.}{/}g;
    my %n;
    for my $r (@roots) {
        opendir my $d, "$r/$dir" or next;
        for (readdir $d) { $n{$1} = 1 if /^(\w+)\.java$/ && $1 ne 'package-info'; }
        closedir $d;
    }
    return sort keys %n;
}

sub module_roots { my ($src) = @_; my ($m) = $src =~ m{^(\w+)/}; my $set = $src =~ m{/src/test/} ? 'test' : 'main';
    return grep { m{^\Q$m\E/} && ($set eq 'test' || m{/main/}) } @ROOTS; }

# Rewrites every reference to $old (fully qualified) as $new, everywhere.
sub rewrite_references {
    my ($old, $new, $moved_files) = @_;
    my ($op, $os) = split_fqn($old);
    my ($np, $ns) = split_fqn($new);
    my %moved = map { $_ => 1 } @$moved_files;
    for my $f (text_files()) {
        my $c = slurp($f);
        my $orig = $c;
        $c =~ s/(?<![\w.])\Q$old\E(?![\w])/$new/g;
        if ($f =~ /\.java$/ && !$moved{$f}) {
            my $pkg = pkg_of($c);
            if ($pkg eq $op && ($op ne $np || $os ne $ns)) {
                # Same-package users of the old type need an import now (unless another type of
                # that simple name is imported, which shadows it in this file), and its new name.
                if (!imports_name($c, $os) && uses($c, $os)) {
                    $c = rename_ident($c, $os, $ns);
                    $c = add_import($c, $new) if $op ne $np;
                }
            } elsif ($os ne $ns && ($c =~ /^\s*import\s+\Q$new\E\s*;/m || $c =~ /^\s*import\s+static\s+\Q$new\E\./m)) {
                $c = rename_ident($c, $os, $ns);
            }
        }
        spew($f, $c) if $c ne $orig;
    }
}

sub move {
    my ($old, $new) = @_;
    my ($op, $os) = split_fqn($old);
    my ($np, $ns) = split_fqn($new);
    my @src = grep { -f "$_/" . path_of($old) } @ROOTS;
    my @dst = grep { -f "$_/" . path_of($new) } @ROOTS;
    if (!@src) {
        if (@dst) { print "  (already) $old -> $new\n"; return; }
        die "restructure: cannot find $old (nor $new) under @ROOTS\n";
    }
    die "restructure: both $old and $new exist; resolve by hand\n" if @dst;
    my @moved;
    for my $r (@src) {
        my $from = "$r/" . path_of($old);
        my $to = "$r/" . path_of($new);
        make_path(dirname($to));
        sh('git', 'mv', $from, $to);
        my $c = slurp($to);
        $c =~ s/^(\s*package\s+)\Q$op\E(\s*;)/$1$np$2/m or die "restructure: no 'package $op;' in $to\n";
        $c = rename_ident($c, $os, $ns);
        # Types of the old package that this file used without an import.
        if ($op ne $np) {
            for my $peer (types_in($op, module_roots($to))) {
                next if $peer eq $os || imports_name($c, $peer);
                $c = add_import($c, "$op.$peer") if uses($c, $peer);
            }
        }
        spew($to, $c);
        push @moved, $to;
    }
    print "  $old -> $new\n";
    rewrite_references($old, $new, \@moved);
    # Its test follows it.
    my $t = "${op}.${os}Test";
    move($t, "${np}.${ns}Test") if grep { m{/src/test/} && -f "$_/" . path_of($t) } @ROOTS;
}

# Lifts OUTER.NAME (a nested enum, record, class or interface) into NEWFQN's own file.
sub nested {
    my ($outer, $name, $new) = @_;
    my ($op, $outs) = split_fqn($outer);
    my ($np, $ns) = split_fqn($new);
    my ($of) = grep { -f } map { "$_/" . path_of($outer) } @ROOTS;
    my ($nf) = grep { -f } map { "$_/" . path_of($new) } @ROOTS;
    die "restructure: cannot find $outer\n" unless $of;
    my $c = slurp($of);
    if ($c !~ /^(\s*)(?:\/\*\*(?:(?!\*\/).|\n)*?\*\/\s*\n)?\s*(?:public\s+|static\s+)*(?:enum|record|class|interface)\s+\Q$name\E\b/m) {
        if ($nf) { print "  (already) $outer.$name -> $new\n"; return; }
        die "restructure: no nested type $name in $of\n";
    }
    die "restructure: $new exists already while $outer.$name is still there\n" if $nf;
    # Find the declaration (with its javadoc) and its body by brace matching.
    $c =~ /(\n([ \t]*)(?:\/\*\*(?:(?!\*\/).|\n)*?\*\/\s*\n[ \t]*)?(?:public\s+|static\s+)*(?:enum|record|class|interface)\s+\Q$name\E\b[^{]*\{)/g
        or die "restructure: cannot parse the declaration of $name in $of\n";
    my $indent = $2;
    my $start = $-[1];
    my $pos = pos($c);
    my $depth = 1;
    my $body = substr($c, $pos);
    my $i = 0;
    my $len = length $body;
    while ($depth > 0) {
        die "restructure: unbalanced braces after $name in $of\n" if $i >= $len;
        my $ch = substr($body, $i, 1);
        if ($ch eq '"' || $ch eq "'") {
            my $q = $ch; $i++;
            while ($i < $len && substr($body, $i, 1) ne $q) { $i++ if substr($body, $i, 1) eq '\\'; $i++; }
        } elsif (substr($body, $i, 2) eq '//') { $i = index($body, "\n", $i); $i = $len - 1 if $i < 0; }
        elsif (substr($body, $i, 2) eq '/*') { $i = index($body, '*/', $i) + 1; }
        elsif ($ch eq '{') { $depth++; }
        elsif ($ch eq '}') { $depth--; }
        $i++;
    }
    my $end = $pos + $i;
    my $decl = substr($c, $start + 1, $end - $start - 1);
    substr($c, $start, $end - $start) = '';
    $c =~ s/\n\n\n+/\n\n/g;
    # Unindent by the nesting depth, make it a public top-level type.
    $decl =~ s/^\Q$indent\E//mg;
    $decl =~ s/^((?:public\s+|static\s+)*)(enum|record|class|interface)\s+\Q$name\E\b/public $2 $ns/m
        or die "restructure: cannot rewrite the header of $name\n";
    my $nfile = $of;
    $nfile =~ s{/[^/]+$}{};
    my $root = (grep { index($of, "$_/") == 0 } @ROOTS)[0];
    $nfile = "$root/" . path_of($new);
    make_path(dirname($nfile));
    spew($nfile, "package $np;\n\n$decl\n");
    spew($of, $c);
    sh('git', 'add', $nfile, $of);
    print "  $outer.$name -> $new\n";
    # References: imports of the nested type and OUTER.NAME qualified uses.
    for my $f (java_files()) {
        my $t = slurp($f);
        my $o = $t;
        my $pkg = pkg_of($t);
        $t =~ s/^(\s*import\s+)\Q$outer.$name\E(\s*;)/$1$new$2/mg;
        $t =~ s/(?<![\w.])\Q$outer.$name\E(?![\w])/$new/g;
        my $had_outer = ($f eq $of) || imports_fqn($t, $outer) || ($pkg eq $op);
        if ($had_outer && $t =~ /(?<![\w.])\Q$outs.$name\E(?![\w])/) {
            $t =~ s/(?<![\w.])\Q$outs.$name\E(?![\w])/$ns/g;
            $t = add_import($t, $new) unless $pkg eq $np;
        }
        if ($f eq $of && uses($t, $name)) {
            $t = rename_ident($t, $name, $ns) if $name ne $ns;
            $t = add_import($t, $new) unless $pkg eq $np;
        }
        spew($f, $t) if $t ne $o;
    }
}

# Copies the static method NAME of OWNER (javadoc included) into NEWFQN (created with OWNER's
# java.* imports), leaves OWNER's method delegating to it, and points the callers in NEWFQN's
# package at it. Skipped where OWNER has no such method (a branch that never added it).
sub lift_method {
    my ($owner, $name, $new) = @_;
    my ($op, $os) = split_fqn($owner);
    my ($np, $ns) = split_fqn($new);
    my ($of) = grep { -f } map { "$_/" . path_of($owner) } @ROOTS;
    my $c = $of ? slurp($of) : '';
    if (!$of || $c !~ /\n([ \t]*)((?:\/\*\*(?:(?!\*\/).|\n)*?\*\/\s*\n[ \t]*)?public\s+static\s+[\w.<>\[\]]+\s+\Q$name\E\s*\([^)]*\)[^{;]*\{)/) {
        print "  (absent) $owner.$name\n";
        return;
    }
    my $indent = $1;
    my $start = $-[2];
    my $open = $+[2];
    my ($depth, $i) = (1, $open);
    while ($depth > 0) {
        die "restructure: unbalanced braces in $owner.$name\n" if $i >= length $c;
        my $ch = substr($c, $i, 1);
        if ($ch eq '"' || $ch eq "'") { my $q = $ch; $i++; while (substr($c, $i, 1) ne $q) { $i++ if substr($c, $i, 1) eq '\\'; $i++; } }
        elsif ($ch eq '{') { $depth++; } elsif ($ch eq '}') { $depth--; }
        $i++;
    }
    my $method = substr($c, $start, $i - $start);
    (my $sig = $method) =~ s/^(?:\/\*\*(?:(?!\*\/).|\n)*?\*\/\s*)?//;
    $sig =~ s/\{.*//s;
    my ($params) = $sig =~ /\Q$name\E\s*\(([^)]*)\)/;
    my $args = join ', ', map { (split /\s+/, $_)[-1] } grep { /\S/ } split /,/, $params;
    my $nf = (grep { index($of, "$_/") == 0 } @ROOTS)[0] . '/' . path_of($new);
    if (-f $nf) { print "  (already) $owner.$name -> $new.$name\n"; return; }
    my @imports = grep { my ($n) = /\.(\w+)\s*;/; $method =~ /\b\Q$n\E\b/ } $c =~ /^(import\s+java[x]?\.[\w.]+\s*;)\s*$/mg;
    my $body = $method;
    $body =~ s/^\Q$indent\E/    /mg;
    $body =~ s/^    // if $body !~ /^    /;
    spew($nf, "package $np;\n\n" . join("\n", @imports) . "\n\n/** Shared by the layers above: {\@link #$name} (moved here from $os, which still offers it). */\n"
        . "public final class $ns {\n\n    private $ns() {\n    }\n\n    " . $body . "\n}\n");
    my $delegate = $sig;
    $delegate =~ s/\s+$//;
    $delegate .= " {\n$indent    return $new.$name($args);\n$indent}";
    substr($c, $start, $i - $start) = "/** Kept for its callers: see {\@link $new#$name}. */\n$indent$delegate";
    spew($of, $c);
    sh('git', 'add', $nf, $of);
    print "  $owner.$name -> $new.$name\n";
    for my $f (java_files()) {
        my $t = slurp($f);
        next unless pkg_of($t) eq $np;
        my $o = $t;
        $t =~ s/(?<![\w.])(?:\Q$owner\E|\Q$os\E)\.\Q$name\E\s*\(/$ns.$name(/g;
        spew($f, $t) if $t ne $o;
    }
}

sub resource {
    my ($from, $to) = @_;
    if (!-e $from) { return print "  (already) $to\n" if -e $to; die "restructure: cannot find $from\n"; }
    make_path(dirname($to));
    sh('git', 'mv', $from, $to);
    print "  $from -> $to\n";
}

sub package_info {
    my ($pkg, $text) = @_;
    (my $dir = $pkg) =~ s{\.}{/}g;
    my ($root) = grep { -d "$_/$dir" && m{/main/} } @ROOTS;
    die "restructure: no main folder for $pkg\n" unless $root;
    my $f = "$root/$dir/package-info.java";
    return if -f $f;
    spew($f, "/** $text */\npackage $pkg;\n");
    sh('git', 'add', $f);
    print "  $f\n";
}

while (my $line = <STDIN>) {
    chomp $line;
    $line =~ s/^\s+|\s+$//g;
    next if $line eq '' || $line =~ /^#/;
    my ($cmd, @a) = split /\s+/, $line, 3;
    if ($cmd eq 'move') { move(split /\s+/, $a[0] . ' ' . $a[1]); }
    elsif ($cmd eq 'maybe-move') {
        my ($o, $n) = split /\s+/, "$a[0] $a[1]";
        if (grep { -f "$_/" . path_of($o) } @ROOTS) { move($o, $n); } else { print "  (absent) $o\n"; }
    }
    elsif ($cmd eq 'nested') { my @b = split /\s+/, "$a[0] $a[1]"; nested(@b); }
    elsif ($cmd eq 'lift-method') { my @b = split /\s+/, "$a[0] $a[1]"; lift_method(@b); }
    elsif ($cmd eq 'resource') { resource($a[0], $a[1]); }
    elsif ($cmd eq 'package-info') { package_info($a[0], $a[1]); }
    else { die "restructure: unknown command '$cmd'\n"; }
}
