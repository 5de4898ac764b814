package staffing

// shiftOrders counts the orders in which the morning team of at most
// eight agents can take the first calls: a bounded loop whose product
// never exceeds 8! = 40320.
func shiftOrders(team int) int {
	if team > 8 {
		team = 8
	}
	orders := 1
	for i := 2; i <= team; i++ {
		orders *= i
	}
	return orders
}

// RotaCount is the number of rotas for the weekend pair of teams.
func RotaCount() int {
	return shiftOrders(4) * shiftOrders(4)
}
