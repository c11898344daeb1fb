module upright

go 1.26
