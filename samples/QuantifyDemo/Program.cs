System.Console.WriteLine("placeholder");
