module example.com/loadfacts

go 1.22
