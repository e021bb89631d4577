"""The ``kernline`` command.

``kernline`` / ``kernline open FILE`` / ``kernline demo`` open the window; ``check``, ``size``,
``report`` and ``schedule`` run headless and never import Qt, so they start fast and run on a server.

Exit codes: 0 every wall passes (or the job was done), 1 a check fails or a wall cannot be sized,
2 bad input (a message on stderr names the field or the path), 3 an internal error (no traceback
unless ``KERNLINE_DEBUG=1``), 130 interrupted (Ctrl+C), 141 standard output was closed early.

Paths are checked before any work: the project FILE must be a regular file (a folder, a named pipe
or a device is refused at once, without reading it); ``-o OUT`` must not be the project file under
any spelling (``./x/../p.kernline``, a symbolic or hard link to it), a folder, a device or a named
pipe, a read-only file, or a file in a missing or read-only folder. An earlier PDF or CSV is
overwritten. ``size --write`` checks that FILE may be written before it sizes anything, and a
refused command leaves FILE as it was.
"""

from __future__ import annotations

import argparse
import json
import os
import sys
from collections.abc import Sequence
from pathlib import Path

from kernline.engine import (
    CAUTION,
    EngineError,
    FilePathError,
    InputError,
    __version__,
    check_input_file,
    check_output_path,
    check_writable,
)

EXIT_OK, EXIT_FAIL, EXIT_INPUT, EXIT_INTERNAL = 0, 1, 2, 3
EXIT_INTERRUPTED = 130  # 128 + SIGINT, what a shell reports for Ctrl+C
EXIT_CLOSED_OUTPUT = 141  # 128 + SIGPIPE, what a shell reports for a program whose output pipe closed


def _parser() -> argparse.ArgumentParser:
    parser = argparse.ArgumentParser(
        prog="kernline",
        description="Stability checks and sizing of concrete strip footings under shear walls. " + CAUTION,
    )
    parser.add_argument("--version", action="version", version=f"kernline {__version__}")
    sub = parser.add_subparsers(dest="command", metavar="COMMAND")

    p = sub.add_parser("open", help="open a project file in the window")
    p.add_argument("file")

    p = sub.add_parser("demo", help="open the built-in demo project in the window (or --save it)")
    p.add_argument("--save", metavar="PATH", help="write the demo project to PATH instead of opening it")

    p = sub.add_parser("check", help="check every wall on its current footing")
    p.add_argument("file")
    p.add_argument("--json", action="store_true", help="print the results as JSON (SI base units)")

    p = sub.add_parser("size", help="find the smallest passing footing of every wall")
    p.add_argument("file")
    p.add_argument("--json", action="store_true", help="print the results as JSON (SI base units)")
    p.add_argument("--write", action="store_true", help="store the chosen sizes back into the file")

    p = sub.add_parser("report", help="write the calculation package (PDF)")
    p.add_argument("file")
    p.add_argument("-o", "--output", required=True, metavar="OUT.pdf")
    p.add_argument("--walls", metavar="A1,B2", help="only these walls (comma-separated ids)")
    p.add_argument(
        "--seal-every-sheet",
        action="store_true",
        help="a small seal box in every sheet's title strip (the cover always has the 3 in seal square)",
    )
    p.add_argument(
        "--verification-appendix",
        action="store_true",
        help="add the verification appendix: the program's benchmark cases run now, published values beside its own",
    )

    p = sub.add_parser("schedule", help="write the footing schedule (CSV)")
    p.add_argument("file")
    p.add_argument("-o", "--output", required=True, metavar="OUT.csv")
    return parser


def main(argv: Sequence[str] | None = None) -> int:
    """Run the command; return its exit code.

    A standard output closed before everything was printed (``kernline check --json FILE | head -1``)
    ends the command quietly with exit code 141, the status a shell reports for a program stopped by
    SIGPIPE, so ``set -o pipefail`` scripts see what they see for any other tool. Standard output is
    then pointed at the null device, as the Python documentation recommends (library reference,
    ``signal`` module, "Note on SIGPIPE"), so that the flush at exit raises nothing. A file the
    command was writing is not affected: it is written completely or not at all.
    """
    args = _parser().parse_args(argv)
    try:
        code = _dispatch(args)
        sys.stdout.flush()  # a closed pipe shows here, not in the interpreter's flush at exit
        return code
    except BrokenPipeError:
        _silence_stdout()
        return EXIT_CLOSED_OUTPUT
    except FilePathError as err:  # names its own path: the project file, or the output
        print(f"kernline: {err.message}", file=sys.stderr)
        return EXIT_INPUT
    except InputError as err:
        where = _where(args)
        print(f"kernline: {'' if err.message.startswith(where) else where}{err.message}", file=sys.stderr)
        return EXIT_INPUT
    except EngineError as err:
        print(f"kernline: {err}", file=sys.stderr)
        return EXIT_INPUT
    except KeyboardInterrupt:
        return EXIT_INTERRUPTED
    except Exception as err:  # never a traceback for the user
        if os.environ.get("KERNLINE_DEBUG"):
            raise
        print(f"kernline: internal error: {type(err).__name__}: {err} (set KERNLINE_DEBUG=1 for details)", file=sys.stderr)
        return EXIT_INTERNAL


def _silence_stdout() -> None:
    """Point standard output at the null device (after its reader went away)."""
    try:
        devnull = os.open(os.devnull, os.O_WRONLY)
        os.dup2(devnull, sys.stdout.fileno())
        os.close(devnull)
    except (OSError, ValueError):  # no file descriptor (a test's captured stdout): nothing to flush
        pass


def _where(args: argparse.Namespace) -> str:
    file = getattr(args, "file", None)
    return f"{file}: " if file else ""


def _dispatch(args: argparse.Namespace) -> int:
    command = args.command
    if command is None:
        return _window(None, demo=False)
    if command == "open":
        return _window(args.file, demo=False)
    if command == "demo":
        if args.save:
            return _save_demo(args.save)
        return _window(None, demo=True)
    if command == "check":
        return _check(args.file, as_json=args.json)
    if command == "size":
        return _size(args.file, as_json=args.json, write=args.write)
    if command == "report":
        return _report(args.file, args.output, args.walls, args.seal_every_sheet, args.verification_appendix)
    if command == "schedule":
        return _schedule(args.file, args.output)
    raise AssertionError(command)  # pragma: no cover - argparse refuses others


def _window(path: str | None, demo: bool) -> int:
    if path is not None:
        check_input_file(path)
    if _no_display():
        print(
            "kernline: no display to open the window on (DISPLAY and WAYLAND_DISPLAY are not set). "
            "The headless commands work here: kernline check, size, report, schedule.",
            file=sys.stderr,
        )
        return EXIT_INTERNAL
    try:
        from kernline.app.main_window import launch
    except ImportError as err:
        print(
            f"kernline: the window cannot start here ({err}). The headless commands work: kernline check, size.", file=sys.stderr
        )
        return EXIT_INTERNAL
    return launch(path=path, demo=demo)


def _no_display() -> bool:
    """True on Linux/BSD with no X or Wayland display and no Qt platform chosen (Qt would abort)."""
    if not sys.platform.startswith(("linux", "freebsd", "openbsd")):
        return False
    if os.environ.get("QT_QPA_PLATFORM"):
        return False
    return not (os.environ.get("DISPLAY") or os.environ.get("WAYLAND_DISPLAY"))


def _save_demo(path: str) -> int:
    from kernline.engine import atomic_write_text, resource_path

    text = resource_path("demo.kernline").read_text(encoding="utf-8")
    atomic_write_text(Path(path), text)
    print(f"wrote the demo project to {path}")
    return EXIT_OK


def _check(path: str, as_json: bool) -> int:
    from kernline.engine import (
        along_lines,
        check_project,
        check_table,
        load_project,
        results_json,
        warnings_for,
        warnings_text,
    )

    check_input_file(path)
    doc = load_project(path)
    results = check_project(doc.project)
    _warn(warnings_text(warnings_for(doc.project, results)))
    if as_json:
        print(json.dumps(results_json(results, project=doc.project), indent=2, allow_nan=False))
    else:
        print(check_table(doc.project, results))
        along = along_lines(results)
        if along:
            print("\nAlong the length (the footing as a beam, ACI 318-19):\n" + "\n".join("  " + line for line in along))
    return EXIT_OK if all(r.passes_all for r in results) else EXIT_FAIL


def _warn(text: str) -> None:
    """Warnings go to stderr (one line each); they never change the exit code."""
    if text:
        print(text, file=sys.stderr)


def _size(path: str, as_json: bool, write: bool) -> int:
    from kernline.engine import (
        check_wall,
        load_project,
        results_json,
        save_project,
        size_footing,
        size_table,
        sized_footing_values,
        sized_wall,
        warnings_for,
        warnings_text,
        with_footing_sizes,
    )

    check_input_file(path)
    if write:  # before the sizing, which takes a while: a file that cannot be written is said at once
        check_writable(path)
    doc = load_project(path)
    project = doc.project
    sized = []
    results = []
    sizes: dict[str, dict[str, float]] = {}
    for wall in project.walls:
        s = size_footing(project, wall)
        sized.append(s)
        if s.feasible:
            sizes[wall.id] = sized_footing_values(wall, s)
        results.append(check_wall(project, sized_wall(wall, s)))
    written: int | None = None
    if write:  # written before anything is printed, so a closed output pipe cannot stop the write
        save_project(path, with_footing_sizes(doc.raw, sizes, project.units))
        written = len(sizes)
    _warn(warnings_text(warnings_for(project, results)))
    if as_json:
        sizing = {s.wall_id: s.as_json() for s in sized}
        print(json.dumps(results_json(tuple(results), sizing, project=project), indent=2, allow_nan=False))
    else:
        print(size_table(project, sized, results))
    if written is not None:
        print(f"wrote {written} footing size(s) to {path}", file=sys.stderr if as_json else sys.stdout)
    return EXIT_OK if all(s.feasible for s in sized) else EXIT_FAIL


def _report(path: str, output: str, walls: str | None, seal_every_sheet: bool = False, verification: bool = False) -> int:
    try:
        from kernline.engine import write_report
    except ImportError:
        print("kernline: the calculation package is not built yet in this version", file=sys.stderr)
        return EXIT_INTERNAL
    from kernline.engine import load_project

    check_input_file(path)
    check_output_path(output, inputs=[path])
    doc = load_project(path)
    ids = [w.strip() for w in walls.split(",")] if walls else None
    write_report(doc, output, wall_ids=ids, seal_every_sheet=seal_every_sheet, verification=verification)
    print(f"wrote {output}")
    return EXIT_OK


def _schedule(path: str, output: str) -> int:
    try:
        from kernline.engine import write_schedule
    except ImportError:
        print("kernline: the CSV schedule is not built yet in this version", file=sys.stderr)
        return EXIT_INTERNAL
    from kernline.engine import load_project

    check_input_file(path)
    check_output_path(output, inputs=[path])
    doc = load_project(path)
    write_schedule(doc.project, output)
    print(f"wrote {output}")
    return EXIT_OK


if __name__ == "__main__":  # pragma: no cover
    sys.exit(main())
