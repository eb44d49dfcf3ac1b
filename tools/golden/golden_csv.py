"""The one output format of the golden tables: '#' comment lines (what the table is, the generator with its
library and version, the command that remakes it), a header row, then rows of floats written with repr, so a
value reads back to the same double."""
import csv
from pathlib import Path


def target_folder(argv):
    """The folder named on the command line (shared/reference by default), created if missing."""
    out = Path(argv[1] if len(argv) > 1 else "shared/reference")
    out.mkdir(parents=True, exist_ok=True)
    return out


def provenance(generator, library):
    """The generator and library lines: generator is the script's path in the repository, library its name and version."""
    return [
        f"# generator: {generator}; library: {library}",
        f"# command: /usr/bin/python3 {generator} shared/reference",
    ]


def write(path, comments, columns, rows):
    with open(path, "w", newline="", encoding="ascii") as handle:
        for line in comments:
            handle.write(line + "\n")
        writer = csv.writer(handle, lineterminator="\n")
        writer.writerow(columns)
        for row in rows:
            writer.writerow([repr(float(v)) for v in row])
