; Inno Setup script for Kernline on Windows (not built here: build the one-folder program with
; PyInstaller on Windows first, see packaging/README.md, then compile this with ISCC.exe).
#define AppName "Kernline"
; The version comes from pyproject.toml: ISCC /DAppVersion=0.1.0 kernline.iss (see packaging/README.md)
#ifndef AppVersion
  #error Pass the version: ISCC /DAppVersion=X.Y.Z kernline.iss
#endif
#define DistDir "..\dist\kernline"

[Setup]
AppId={{5B0E3E7A-2C1B-4F7E-9B61-6A1C0D9E4F21}
AppName={#AppName}
AppVersion={#AppVersion}
AppPublisher=Kernline developers
DefaultDirName={autopf}\Kernline
DefaultGroupName=Kernline
OutputBaseFilename=kernline-{#AppVersion}-setup
SetupIconFile=..\..\resources\icons\kernline.ico
Compression=lzma2
SolidCompression=yes
ChangesAssociations=yes
ArchitecturesInstallIn64BitMode=x64compatible

[Files]
Source: "{#DistDir}\*"; DestDir: "{app}"; Flags: recursesubdirs ignoreversion

[Icons]
Name: "{group}\Kernline"; Filename: "{app}\kernline-window.exe"
Name: "{autodesktop}\Kernline"; Filename: "{app}\kernline-window.exe"; Tasks: desktopicon

[Tasks]
Name: "desktopicon"; Description: "Create a desktop shortcut"; Flags: unchecked

[Registry]
Root: HKA; Subkey: "Software\Classes\.kernline"; ValueType: string; ValueName: ""; ValueData: "Kernline.Project"; Flags: uninsdeletevalue
Root: HKA; Subkey: "Software\Classes\Kernline.Project"; ValueType: string; ValueName: ""; ValueData: "Kernline project"; Flags: uninsdeletekey
Root: HKA; Subkey: "Software\Classes\Kernline.Project\DefaultIcon"; ValueType: string; ValueName: ""; ValueData: "{app}\kernline-window.exe,0"
Root: HKA; Subkey: "Software\Classes\Kernline.Project\shell\open\command"; ValueType: string; ValueName: ""; ValueData: """{app}\kernline-window.exe"" open ""%1"""

[Run]
Filename: "{app}\kernline-window.exe"; Description: "Start Kernline"; Flags: nowait postinstall skipifsilent
