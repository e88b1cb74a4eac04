#!/usr/bin/env perl
# Reads javac's output on standard input and makes public each member or type that a package
# move left out of reach ("X is not public in Y; cannot be accessed from outside package").
# Prints one line per change; exits 3 when it found such errors but could change nothing.
use strict;
use warnings;

my @ROOTS = grep { -d } map { my $m = $_; map { "$m/src/$_/java" } qw(main test) } qw(engine viewer);
my (%seen, $found, $changed);
while (my $line = <STDIN>) {
    next unless $line =~ /(?:^|\s)([\w.\$]+)(\([^)]*\))? is not public in ([\w.]+); cannot be accessed from outside package/;
    my ($name, $args, $owner) = ($1, $2, $3);
    next if $seen{"$name|$owner|" . ($args // '')}++;
    $found++;
    # The owner is a class (member case) or a package (type case).
    my ($file, $member, $kind);
    my $class_file = sub { my ($fqn) = @_; my @parts = split /\./, $fqn;
        for my $i (reverse 1 .. $#parts) { my $p = join('/', @parts[0 .. $i]) . '.java';
            for my $r (@ROOTS) { return ("$r/$p", $parts[-1]) if -f "$r/$p"; } }
        return; };
    if (my ($f, $inner) = $class_file->($owner)) {
        ($file, $member, $kind) = ($f, $name, defined $args ? 'method' : 'field');
        (my $simple = $owner) =~ s/.*\.//;
        $kind = 'ctor' if $name eq $simple && defined $args;
    } else {
        my ($f, $inner) = $class_file->($name);
        die "open-access: cannot find the source of $name (in $owner)\n" unless $f;
        ($file, $member, $kind) = ($f, $inner, 'type');
    }
    open my $h, '<', $file or die "open-access: $file: $!\n";
    local $/; my $c = <$h>; close $h;
    my $mods = qr/(?:(?:static|final|abstract|synchronized|sealed|non-sealed|strictfp|default)\s+)*/;
    my $n = 0;
    if ($kind eq 'type') {
        $n = $c =~ s/^([ \t]*)(?!public\b|private\b|protected\b)($mods(?:class|record|enum|interface)\s+\Q$member\E\b)/$1public $2/m;
    } elsif ($kind eq 'ctor') {
        $n = $c =~ s/^([ \t]*)(?!public\b|private\b|protected\b)(\Q$member\E\s*\()/$1public $2/mg;
    } elsif ($kind eq 'method') {
        $n = $c =~ s/^([ \t]*)(?!public\b|private\b|protected\b|return\b|new\b)($mods(?:<[^>]*>\s+)?(?!else\b|throw\b|yield\b)[A-Za-z_][\w.<>\[\], ?]*?\s+\Q$member\E\s*\()/$1public $2/mg;
        # A record's accessor or component used from outside is already public; nothing else to do.
    } else {
        $n = $c =~ s/^([ \t]*)(?!public\b|private\b|protected\b|return\b)($mods(?!else\b|throw\b|yield\b)[A-Za-z_][\w.<>\[\], ?]*?\s+\Q$member\E\s*(?:=|;))/$1public $2/mg;
    }
    if ($n) {
        open my $o, '>', $file or die; print $o $c; close $o;
        print "  public: $kind $member in $file\n";
        $changed++;
    } else {
        print STDERR "open-access: could not find the declaration of $kind $member in $file\n";
    }
}
exit(($found && !$changed) ? 3 : 0);
