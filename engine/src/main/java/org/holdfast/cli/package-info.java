/**
 * The command line: one picocli class per subcommand, one exception handler that turns bad
 * input into a single line and exit code 2.
 */
package org.holdfast.cli;
