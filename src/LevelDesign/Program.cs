// Temporary entry until the command line (owned by the device-files work) is merged: it will call TerminalApp.Run.
return LevelDesign.Ui.TerminalApp.Run(null, args.Length > 0 ? args[0] : null);
