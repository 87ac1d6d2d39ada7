Console.WriteLine("leveldesign");
