"""Entry point of the frozen build: the same `kernline` command as the installed one."""

import sys

from kernline.app.cli import main

if __name__ == "__main__":
    sys.exit(main())
