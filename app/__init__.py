"""Kernline's Qt window and the ``kernline`` command.

Importing this package imports no Qt: the headless subcommands of :mod:`app.cli` must start fast and
run where no Qt is installed. Qt is imported only by the window modules.
"""
