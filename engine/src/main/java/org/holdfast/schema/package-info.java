/** The grammar of input files, below every domain package: a checked TOML tree (Node) with file:line:key errors, --set overrides and the number reader each value passes through. */
package org.holdfast.schema;
