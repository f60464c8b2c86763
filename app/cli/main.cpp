#include "cli/run_cli.hpp"

#include <iostream>

int main(int argc, char** argv) { return atollog::cli::runCli(argc, argv, std::cout, std::cerr); }
