/** The interface every `holdfast bench` suite implements (found through ServiceLoader); the command is cli.BenchCommand. */
package org.holdfast.bench;
