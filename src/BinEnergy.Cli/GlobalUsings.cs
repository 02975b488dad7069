// The namespaces most files of the command line use: Spectre's command types, the attributes options are declared with, the option helpers, and the result documents.
global using System.ComponentModel;
global using BinEnergy.Cli.Options;
global using BinEnergy.Reporting.Output;
global using Spectre.Console.Cli;
